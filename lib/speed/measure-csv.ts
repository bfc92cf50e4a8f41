import Papa from "papaparse";
import { MIN_FORCE_HZ, samplingHz } from "./force-trace";
import { MIN_TRACE_HZ } from "./speed-trace";
import type { CsvProblem } from "./timing-csv";

// Our CSV layouts for speed traces, vertical force traces and contact measurements (lib/speed/README.md §8, §9):
// numbers only, one sample or one contact per row. Every line is checked before anything is saved; the whole
// file is refused when it cannot be one of these (empty, wrong columns, noise, sampled too slowly).

export type MeasureKind = "trace" | "force" | "contacts";

type Column = { name: string; required: boolean; min: number; max: number; what: string };

export const MEASURE_CSV_LAYOUTS: Record<MeasureKind, readonly Column[]> = {
  trace: [
    { name: "time_s", required: true, min: 0, max: 86_400, what: "time" },
    // 15 m/s is well above any human sprint (the fit's own box, lib/speed/sprint-fit.ts).
    { name: "speed_ms", required: true, min: 0, max: 15, what: "speed" },
  ],
  force: [
    { name: "time_s", required: true, min: 0, max: 86_400, what: "time" },
    // A plate at rest may read a little below zero; 20 kN is above ten body weights of a heavy athlete.
    { name: "force_n", required: true, min: -500, max: 20_000, what: "force" },
  ],
  contacts: [
    { name: "contact_time_s", required: true, min: 0.02, max: 2, what: "contact time" },
    { name: "flight_time_s", required: true, min: 0, max: 2, what: "flight time" },
    { name: "step_length_m", required: false, min: 0.3, max: 4, what: "step length" },
  ],
};

/** Rows we read at most: 40 minutes at 50 Hz for a trace, a few minutes at 1000 Hz for force (the 2 MB cap first). */
const MEASURE_CSV_MAX_ROWS = 200_000;
const MIN_HZ: Partial<Record<MeasureKind, number>> = { trace: MIN_TRACE_HZ, force: MIN_FORCE_HZ };

export type MeasureCsvResult =
  | { ok: true; columns: Record<string, (number | null)[]>; rows: number }
  | { ok: false; file: string | null; problems: CsvProblem[] };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** Reads one of our measurement layouts; problems are reported by line and column (the header is line 1). */
export function parseMeasureCsv(kind: MeasureKind, text: string): MeasureCsvResult {
  const layout = MEASURE_CSV_LAYOUTS[kind];
  const fail = (file: string | null, problems: CsvProblem[] = []): MeasureCsvResult => ({ ok: false, file, problems });
  if (text.trim() === "") return fail("The file is empty");
  if (/[\u0000-\u0008\u000e-\u001f]/.test(text))
    return fail("The file is not CSV text (it contains control characters)");
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const header = parsed.meta.fields ?? [];
  const names = layout.map((c) => c.name);
  const missing = layout.filter((c) => c.required && !header.includes(c.name)).map((c) => c.name);
  const unknown = header.filter((h) => !names.includes(h));
  if (missing.length || unknown.length) {
    const parts = [
      missing.length ? `missing column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}` : "",
      unknown.length
        ? `unknown column${unknown.length > 1 ? "s" : ""} ${unknown
            .slice(0, 5)
            .map((u) => u.slice(0, 40))
            .join(", ")}`
        : "",
    ].filter(Boolean);
    return fail(`Wrong columns: ${parts.join("; ")}. Expected ${names.join(",")}`);
  }
  const rows = parsed.data;
  if (rows.length === 0) return fail("The file has a header but no rows");
  if (rows.length > MEASURE_CSV_MAX_ROWS) return fail(`The file has over ${MEASURE_CSV_MAX_ROWS} rows`);

  const problems: CsvProblem[] = parsed.errors
    .filter((e) => e.code !== "UndetectableDelimiter")
    .map((e) => ({ line: (e.row ?? 0) + 2, column: null, message: e.message }));
  const columns: Record<string, (number | null)[]> = Object.fromEntries(names.map((n) => [n, []]));
  rows.forEach((row, i) => {
    const line = i + 2;
    for (const c of layout) {
      const raw = (row[c.name] ?? "").trim();
      if (raw === "") {
        if (c.required) problems.push({ line, column: c.name, message: `The ${c.what} is missing` });
        columns[c.name].push(null);
        continue;
      }
      const v = NUMBER.test(raw) ? Number(raw) : NaN;
      if (!Number.isFinite(v))
        problems.push({ line, column: c.name, message: `${c.name} is not a number: "${raw.slice(0, 40)}"` });
      else if (v < c.min || v > c.max)
        problems.push({ line, column: c.name, message: `${c.name} must be ${c.min}–${c.max}` });
      columns[c.name].push(Number.isFinite(v) ? v : null);
    }
    if (problems.length > 200) return;
  });
  if (kind !== "contacts" && problems.length === 0) {
    const t = columns.time_s as number[];
    for (let k = 1; k < t.length; k++) {
      if (!(t[k] > t[k - 1])) {
        problems.push({
          line: k + 2,
          column: "time_s",
          message: `Times go backwards or repeat: ${t[k]} s after ${t[k - 1]} s`,
        });
        if (problems.length > 200) break;
      }
    }
    if (problems.length === 0) {
      const hz = samplingHz(t);
      const min = MIN_HZ[kind]!;
      if (t.length < 2) return fail(`A ${kind === "trace" ? "speed" : "force"} trace needs at least two samples`);
      if (hz < min) {
        return fail(
          `The ${kind === "trace" ? "speed" : "force"} trace is sampled at ${hz.toFixed(1)} Hz; ` +
            `at least ${min} Hz is needed`,
        );
      }
    }
  }
  if (problems.length) return fail(null, problems.slice(0, 200));
  return { ok: true, columns, rows: rows.length };
}
