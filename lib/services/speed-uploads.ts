import "server-only";
import { listSquad } from "@/lib/data/athletes";
import { AppError, type FieldErrors } from "@/lib/errors";
import { parseTimingCsv, type CsvProblem } from "@/lib/speed/timing-csv";
import { timingTrialSchema } from "@/lib/validations/speed";
import { recordTimingTrials } from "./speed-lab";

// A timing-gate CSV upload (lib/speed/README.md §5): every line is checked first; one problem anywhere and
// nothing is saved (400 naming the lines). A clean file is kept as it came, with one test per trial.

function refuse(file: string | null, problems: CsvProblem[]): never {
  const fields: FieldErrors = {};
  if (file) fields.file = [file];
  for (const p of problems) (fields[`line ${p.line}${p.column ? ` ${p.column}` : ""}`] ??= []).push(p.message);
  const message = file
    ? `${file}. Nothing was saved.`
    : `${problems.length} problem${problems.length > 1 ? "s" : ""} in the file (first on line ${problems[0].line}: ` +
      `${problems[0].message}). Nothing was saved.`;
  throw new AppError("invalid", message, { fields, details: { problems: problems.slice(0, 200) } });
}

export async function uploadTimingCsv({
  teamId,
  userId,
  fileName,
  content,
}: {
  teamId: number;
  userId: number;
  fileName: string;
  content: string;
}) {
  const squad = await listSquad({ teamId });
  const read = parseTimingCsv(content, squad);
  if (!read.ok) refuse(read.file, read.problems);
  const problems: CsvProblem[] = [];
  const trials = read.trials.flatMap((t) => {
    const parsed = timingTrialSchema.safeParse(t);
    if (parsed.success) return [parsed.data];
    for (const issue of parsed.error.issues) {
      const column = issue.path[0] === "testDate" ? "date" : issue.path[0] === "gates" ? "time_s" : null;
      problems.push({ line: t.lines[0], column, message: issue.message });
    }
    return [];
  });
  if (problems.length) refuse(null, problems);
  const saved = await recordTimingTrials({ teamId, userId, trials, upload: { fileName, content } });
  return {
    ...saved,
    trials: read.trials.map((t, i) => ({ testId: saved.testIds[i], athleteName: t.athleteName, testDate: t.testDate })),
  };
}
