import Papa from "papaparse";
import type { SpeedStartType } from "@/lib/domain/speed";
import type { GateTime } from "./sprint-fit";
import { TIMING_CSV_COLUMNS } from "./timing-csv";

// Tests typed in on a form go through the same checks and storage as an uploaded file (lib/speed/README.md §5,
// §9): the form writes the canonical CSV of what was typed (our own layout), which is sent and kept as the
// original. The server's per-line messages come back onto the form's fields.

export type TypedTimingTrial = {
  athleteName: string;
  testDate: string;
  startType: SpeedStartType;
  bodyMassKg?: number | null;
  gates: readonly GateTime[];
  flying?: { lengthM: number; timeS: number } | null;
};

export type TypedContactRow = { contactTimeS: number; flightTimeS: number; stepLengthM?: number | null };

const cell = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? "" : String(v));

/** One trial in the timing-gate layout: a row per gate, or the flying zone's one row. */
export function timingTrialCsv(t: TypedTimingTrial): string {
  const base = { athlete: t.athleteName, date: t.testDate, trial: "1", start: t.startType };
  const mass = cell(t.bodyMassKg);
  const rows =
    t.startType === "flying" && t.flying
      ? [{ ...base, distance_m: cell(t.flying.lengthM), time_s: cell(t.flying.timeS), body_mass_kg: mass }]
      : t.gates.map((g) => ({ ...base, distance_m: cell(g.distanceM), time_s: cell(g.timeS), body_mass_kg: mass }));
  return Papa.unparse({ fields: [...TIMING_CSV_COLUMNS], data: rows.map((r) => TIMING_CSV_COLUMNS.map((c) => r[c])) });
}

/** Contact-mat rows in the contacts layout. */
export function contactRowsCsv(rows: readonly TypedContactRow[]): string {
  return Papa.unparse({
    fields: ["contact_time_s", "flight_time_s", "step_length_m"],
    data: rows.map((r) => [cell(r.contactTimeS), cell(r.flightTimeS), cell(r.stepLengthM)]),
  });
}

/** A flying trial is its zone only; any other start is its gates only (what the CSV holds). */
export function normaliseTypedTrial<T extends { startType: string; gates: unknown[]; flying?: unknown }>(t: T): T {
  return t.startType === "flying" ? { ...t, gates: [] } : { ...t, flying: null };
}

const TIMING_FIELD: Record<string, string> = { distance_m: "distanceM", time_s: "timeS" };
const CONTACT_FIELD: Record<string, string> = {
  contact_time_s: "contactTimeS",
  flight_time_s: "flightTimeS",
  step_length_m: "stepLengthM",
};

/**
 * Where a server message about the canonical CSV belongs on the form: "line 3 time_s" of a typed trial is the
 * second gate's time (line 1 is the header), of a flying trial the zone's; "line 2 date" is the date. Null when
 * it names no field of the form (the caller shows the message as a whole).
 */
export function typedFieldOf(kind: "timing" | "contacts", key: string, flying = false): string | null {
  if (key === "testDate" || key === "bodyMassKg") return key;
  const m = /^line (\d+) (\w+)$/.exec(key);
  if (!m) return null;
  const index = Number(m[1]) - 2;
  const column = m[2];
  if (kind === "contacts") return CONTACT_FIELD[column] ? `rows.${index}.${CONTACT_FIELD[column]}` : null;
  if (column === "date") return "testDate";
  if (column === "body_mass_kg") return "bodyMassKg";
  if (column === "start") return "startType";
  if (column === "athlete") return "athleteId";
  const field = TIMING_FIELD[column];
  if (!field) return null;
  return flying ? `flying.${field === "distanceM" ? "lengthM" : "timeS"}` : `gates.${index}.${field}`;
}
