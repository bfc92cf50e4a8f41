import "server-only";
import { loadSessions } from "@/lib/data/plan-rows";
import { getAthleteSpeedRow, listProfileEntries } from "@/lib/data/speed-profiles";
import { insertSpeedTests, insertSpeedUpload } from "@/lib/data/speed-tests";
import { getTeamLoadSettings } from "@/lib/data/team-settings";
import { inTeamTransaction } from "@/lib/data/transaction";
import { AppError, type FieldErrors } from "@/lib/errors";
import { DEFAULT_VMAX } from "@/lib/load/types";
import { analyseContactRows, analyseForceTrace } from "@/lib/speed/contact-analysis";
import { parseMeasureCsv } from "@/lib/speed/measure-csv";
import { entryInForce } from "@/lib/speed/profile-values";
import { analyseSpeedTrace, chartPoints } from "@/lib/speed/speed-trace";
import type { CsvProblem } from "@/lib/speed/timing-csv";
import type { SpeedMeasureUploadInput } from "@/lib/validations/speed";

// Speed traces, force traces and contact measurements (lib/speed/README.md §8, §9): the file is read and checked
// whole before anything is saved (400 naming what is wrong); a clean file is kept as it came, with one test
// holding the analysis. A speed trace attached to a planned session is that session's measured running load.

function refuse(file: string | null, problems: CsvProblem[]): never {
  const fields: FieldErrors = {};
  if (file) fields.file = [file];
  for (const p of problems) (fields[`line ${p.line}${p.column ? ` ${p.column}` : ""}`] ??= []).push(p.message);
  const message = file
    ? `${file}. Nothing was saved.`
    : `${problems.length} problem${problems.length > 1 ? "s" : ""} in the file (first on line ${problems[0].line}: ` +
      `${problems[0].message}). Nothing was saved.`;
  throw new AppError("invalid", message, { fields, details: { problems } });
}

/** The speed profile's vmax in force on `date` (lib/speed/README.md §4); the athlete's current one otherwise. */
async function vmaxOn(teamId: number, athleteId: number, date: string, current: number | null): Promise<number> {
  const inForce = entryInForce(await listProfileEntries({ teamId, athleteId }), date);
  return inForce?.vmaxMs ?? current ?? DEFAULT_VMAX;
}

export async function uploadMeasurement({
  teamId,
  userId,
  input,
}: {
  teamId: number;
  userId: number;
  input: SpeedMeasureUploadInput;
}): Promise<{ testId: number; uploadId: number }> {
  const { kind, athleteId, testDate, fileName, content } = input;
  const athlete = await getAthleteSpeedRow({ teamId, athleteId }).catch(() => {
    throw new AppError("invalid", "Choose an athlete of the team", { fields: { athleteId: ["Unknown athlete"] } });
  });
  const plannedSessionId = kind === "trace" ? (input.plannedSessionId ?? null) : null;
  if (input.plannedSessionId && kind !== "trace") {
    throw new AppError("invalid", "Only a speed trace can be attached to a planned session", {
      fields: { plannedSessionId: ["Only for speed traces"] },
    });
  }
  if (plannedSessionId) {
    const [session] = await loadSessions({ id: plannedSessionId, athleteId });
    if (!session) {
      throw new AppError("invalid", "The session is not one of this athlete's", {
        fields: { plannedSessionId: ["Not this athlete's session"] },
      });
    }
    if (session.dto.date !== testDate) {
      throw new AppError("invalid", `The session is on ${session.dto.date}, the trace on ${testDate}`, {
        fields: { testDate: ["Must be the session's date"] },
      });
    }
  }
  const bodyMassKg = input.bodyMassKg ?? athlete.bodyMassKg;
  if (kind === "force" && !bodyMassKg) {
    throw new AppError("invalid", "A force trace needs the athlete's body mass", {
      fields: { bodyMassKg: ["Enter the body mass"] },
    });
  }

  const read = parseMeasureCsv(kind, content);
  if (!read.ok) refuse(read.file, read.problems);
  const col = (name: string) => read.columns[name] as number[];
  let data: unknown;
  let result: unknown;
  if (kind === "trace") {
    const trace = { t: col("time_s"), v: col("speed_ms") };
    const [settings, bandVmax] = await Promise.all([
      getTeamLoadSettings({ teamId }),
      vmaxOn(teamId, athleteId, testDate, athlete.vmaxMs),
    ]);
    data = { samples: read.rows, chart: chartPoints(trace) };
    result = analyseSpeedTrace(trace, bandVmax, settings);
  } else if (kind === "force") {
    const trace = { t: col("time_s"), f: col("force_n") };
    data = { samples: read.rows };
    result = analyseForceTrace(trace, bodyMassKg!);
  } else {
    const rows = col("contact_time_s").map((contactTimeS, i) => ({
      contactTimeS,
      flightTimeS: col("flight_time_s")[i],
      stepLengthM: read.columns.step_length_m[i],
    }));
    data = { rows };
    result = analyseContactRows(rows);
  }
  return inTeamTransaction(teamId, async (transaction) => {
    const { id: uploadId } = await insertSpeedUpload({ teamId, userId, kind, fileName, content, transaction });
    const [testId] = await insertSpeedTests({
      teamId,
      userId,
      uploadId,
      tests: [{ athleteId, kind, testDate, startType: null, bodyMassKg, plannedSessionId, data, result }],
      transaction,
    });
    return { testId, uploadId };
  });
}
