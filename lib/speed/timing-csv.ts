import Papa from "papaparse";
import { SPEED_START_TYPES, type SpeedStartType } from "@/lib/domain/speed";
import type { GateTime } from "./sprint-fit";

// Our timing-gate CSV layout (lib/speed/README.md §5): one row per gate, trials told apart by athlete, date and
// trial number. Every problem is reported by line before anything is saved.

export const TIMING_CSV_COLUMNS = [
  "athlete",
  "date",
  "trial",
  "start",
  "distance_m",
  "time_s",
  "body_mass_kg",
] as const;
const REQUIRED = ["athlete", "date", "start", "distance_m", "time_s"] as const;
/** A header line, then at most this many rows: a season's testing of a big squad fits many times over. */
const TIMING_CSV_MAX_ROWS = 5000;

export type CsvProblem = { line: number; column: string | null; message: string };

type ParsedTimingTrial = {
  athleteId: number;
  athleteName: string;
  testDate: string;
  trial: number;
  startType: SpeedStartType;
  bodyMassKg: number | null;
  gates: GateTime[];
  flying: { lengthM: number; timeS: number } | null;
  lines: number[];
};

export type TimingCsvResult =
  | { ok: true; trials: ParsedTimingTrial[] }
  /** `file`: the file as a whole cannot be read (nothing per line); `problems`: what is wrong on which line. */
  | { ok: false; file: string | null; problems: CsvProblem[] };

const fail = (file: string | null, problems: CsvProblem[] = []): TimingCsvResult => ({ ok: false, file, problems });

function numberOf(raw: string): number | null {
  const t = raw.trim();
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return null;
  return Number(t);
}

/** Reads the CSV text against the team's athletes (matched by name, ignoring case and extra spaces). */
export function parseTimingCsv(text: string, athletes: readonly { id: number; name: string }[]): TimingCsvResult {
  if (text.trim() === "") return fail("The file is empty");
  if (/[\u0000-\u0008\u000e-\u001f]/.test(text))
    return fail("The file is not CSV text (it contains control characters)");
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const header = parsed.meta.fields ?? [];
  const missing = REQUIRED.filter((c) => !header.includes(c));
  const unknown = header.filter((c) => !(TIMING_CSV_COLUMNS as readonly string[]).includes(c));
  if (missing.length || unknown.length) {
    const parts = [
      missing.length ? `missing column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}` : "",
      unknown.length ? `unknown column${unknown.length > 1 ? "s" : ""} ${unknown.slice(0, 5).join(", ")}` : "",
    ].filter(Boolean);
    return fail(`Wrong columns: ${parts.join("; ")}. Expected ${TIMING_CSV_COLUMNS.join(",")} (see the template)`);
  }
  if (parsed.data.length === 0) return fail("The file has a header but no rows");
  if (parsed.data.length > TIMING_CSV_MAX_ROWS) return fail(`The file has over ${TIMING_CSV_MAX_ROWS} rows`);

  const byName = new Map<string, { id: number; name: string }[]>();
  for (const a of athletes) {
    const key = a.name.trim().replace(/\s+/g, " ").toLowerCase();
    byName.set(key, [...(byName.get(key) ?? []), a]);
  }
  const problems: CsvProblem[] = [];
  for (const e of parsed.errors) {
    if (e.code === "UndetectableDelimiter") continue;
    problems.push({ line: (e.row ?? 0) + 2, column: null, message: e.message });
  }
  const trials = new Map<string, ParsedTimingTrial>();
  parsed.data.forEach((row, i) => {
    const line = i + 2; // line 1 is the header
    const problem = (column: string | null, message: string) => problems.push({ line, column, message });
    const cell = (c: string) => (row[c] ?? "").trim();
    const name = cell("athlete").replace(/\s+/g, " ");
    const found = byName.get(name.toLowerCase()) ?? [];
    if (!name) problem("athlete", "The athlete is missing");
    else if (found.length === 0) problem("athlete", `Unknown athlete "${name.slice(0, 80)}"`);
    else if (found.length > 1) problem("athlete", `Two athletes are called "${name}"`);
    const date = cell("date");
    if (!/^\d{4}-\d{2}-\d{2}$/.test(date)) problem("date", "The date must be YYYY-MM-DD");
    const start = cell("start").toLowerCase();
    if (!(SPEED_START_TYPES as readonly string[]).includes(start)) {
      problem("start", `The start must be one of ${SPEED_START_TYPES.join(", ")}`);
    }
    const numeric = (c: string, required: boolean): number | null => {
      const raw = cell(c);
      if (raw === "") {
        if (required) problem(c, c === "distance_m" ? "The distance is missing" : `${c} is missing`);
        return null;
      }
      const v = numberOf(raw);
      if (v === null) problem(c, `${c} is not a number: "${raw.slice(0, 40)}"`);
      else if (v < 0) problem(c, `${c} cannot be negative`);
      return v;
    };
    const distance = numeric("distance_m", true);
    const time = numeric("time_s", true);
    const mass = numeric("body_mass_kg", false);
    const trialNo = numeric("trial", false) ?? 1;
    if (found.length !== 1 || distance === null || time === null) return;
    const key = `${found[0].id}|${date}|${trialNo}`;
    let t = trials.get(key);
    if (!t) {
      t = {
        athleteId: found[0].id,
        athleteName: found[0].name,
        testDate: date,
        trial: trialNo,
        startType: start as SpeedStartType,
        bodyMassKg: mass,
        gates: [],
        flying: null,
        lines: [],
      };
      trials.set(key, t);
    }
    t.lines.push(line);
    if (start === "flying") {
      if (t.flying) problem("distance_m", "A flying trial has one row: the zone's length and time");
      else t.flying = { lengthM: distance, timeS: time };
      return;
    }
    const prev = t.gates.filter((g) => g.distanceM < distance).at(-1);
    const next = t.gates.find((g) => g.distanceM > distance);
    if (t.gates.some((g) => g.distanceM === distance)) problem("distance_m", `The ${distance} m gate is listed twice`);
    else if ((prev && !(time > prev.timeS)) || (next && !(time < next.timeS))) {
      problem("time_s", `Times go backwards: ${time} s at ${distance} m`);
    }
    t.gates.push({ distanceM: distance, timeS: time });
    t.gates.sort((a, b) => a.distanceM - b.distanceM);
  });
  if (problems.length)
    return fail(
      null,
      problems.sort((a, b) => a.line - b.line),
    );
  return { ok: true, trials: [...trials.values()] };
}
