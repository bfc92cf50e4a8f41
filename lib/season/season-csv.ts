// The season view as CSV: one line per athlete × week, the load caution first. Pure.
import { toCsv } from "@/lib/format/csv";
import { LOAD_CAUTION } from "@/lib/load/flag-display";
import { SEASON_PHASE_LABELS } from "@/lib/domain/season";
import type { GridPhase, SeasonRow } from "./season-grid";

type Athlete = { name: string; groupName: string | null } & SeasonRow;

const FIELDS = [
  "athlete",
  "group",
  "week_start",
  "phase",
  "logged_or_planned",
  "hsr_m",
  "near_max_m",
  "contacts",
  "srpe_au",
  "acwr",
  "change_pct",
  "flags",
  "off_target",
];

const round = (v: number | null, digits: number) => (v === null ? "" : Number(v.toFixed(digits)));

export function seasonCsv({
  athletes,
  phases,
}: {
  athletes: readonly Athlete[];
  phases: readonly GridPhase[];
}): string {
  const phaseName = new Map(phases.map((p) => [p.id, `${p.name} (${SEASON_PHASE_LABELS[p.kind]})`]));
  const data = athletes.flatMap((a) =>
    a.cells.map((c) => [
      a.name,
      a.groupName ?? "",
      c.weekStart,
      c.phaseId === null ? "" : (phaseName.get(c.phaseId) ?? ""),
      c.past ? "logged" : "planned",
      round(c.totals.hsrM, 0),
      round(c.totals.nearMaxM, 0),
      round(c.totals.contacts, 0),
      round(c.totals.srpe, 0),
      round(c.ratio, 2),
      round(c.changePct, 1),
      c.flagKinds.join(" "),
      c.targets
        .filter((t) => t.standing !== "within")
        .map((t) => `${t.metric} ${t.standing}`)
        .join(" "),
    ]),
  );
  return `# ${LOAD_CAUTION}\r\n${toCsv(FIELDS, data)}`;
}
