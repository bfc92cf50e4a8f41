"use client";

import { columnVisibilityFeature, createColumnHelper, tableFeatures, type Row } from "@tanstack/react-table";
import { AthleteNameCell, sortAndFilterFeatures } from "@/components/ui/sort-table";
import type { SquadWeekRowDto } from "@/lib/data/load-views";
import { formatNumber } from "@/lib/format/number";
import type { FlagKind } from "@/lib/load/flags";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import { AcwrCell } from "./acwr-cell";
import { FlagBadges } from "./flag-badge";

export const squadFeatures = tableFeatures({ ...sortAndFilterFeatures(), columnVisibilityFeature });

type Features = typeof squadFeatures;
/** `estimated`: the team counts a missing log's plan as an estimate (settings.missingLogs). */
export type SquadRow = SquadWeekRowDto & { acwrMetric: Metric; estimated: boolean };
export type FlagFilter = "any" | FlagKind;

const helper = createColumnHelper<Features, SquadRow>();

/** Column ids the CSV and the column chooser know, with their plain labels. */
export const COLUMN_LABELS: Record<string, string> = {
  name: "Athlete",
  group: "Group",
  hsrM: "HSR m",
  nearMaxM: "Near-max m",
  sprintSteps: "Sprint steps (est.)",
  contacts: "Plyo contacts",
  weightedContacts: "Contacts by intensity",
  absHsrM: "≥ HSR speed m",
  absSprintM: "≥ sprint speed m",
  relHsrM: "≥ HSR % m",
  relNearMaxM: "≥ near-max % m",
  relMaximalM: "≥ maximal % m",
  srpe: "sRPE (AU)",
  ratio: "ACWR",
  change: "Weekly change",
  flags: "Flags",
};

/** Right-aligned numeric columns, and the one-line explanation shown on each header. */
const BAND_COLUMNS = ["absHsrM", "absSprintM", "relHsrM", "relNearMaxM", "relMaximalM"] as const;
type BandColumn = (typeof BAND_COLUMNS)[number];
export const NUMERIC_COLUMNS = new Set([
  "hsrM",
  "nearMaxM",
  "sprintSteps",
  "contacts",
  "weightedContacts",
  ...BAND_COLUMNS,
  "srpe",
  "ratio",
  "change",
]);
export const COLUMN_HINTS: Record<string, string> = {
  hsrM: METRIC_INFO.hsrM.description,
  nearMaxM: METRIC_INFO.nearMaxM.description,
  sprintSteps: `${METRIC_INFO.sprintSteps.description} An estimate.`,
  contacts: `${METRIC_INFO.contacts.description} Judged per session against the NSCA's off-season ranges.`,
  weightedContacts: "The week's contacts weighted by intensity: low × 1, moderate × 2, high × 3.",
  absHsrM: "Metres at or above the team's absolute HSR speed (5.5 m/s unless changed), the same for everyone.",
  absSprintM: "Metres at or above the team's absolute sprint speed (7.0 m/s unless changed).",
  relHsrM: "Metres at or above the team's relative HSR share of each athlete's own vmax (75% unless changed).",
  relNearMaxM: "Metres at or above the near-max share of each athlete's own vmax (90% unless changed).",
  relMaximalM: "Metres at or above the maximal share of each athlete's own vmax (95% unless changed).",
  srpe: METRIC_INFO.srpe.description,
  ratio: "Highest acute:chronic workload ratio of the team metric this week (team method).",
  change: "Change of the team metric against last week.",
};

function metricColumn(metric: Metric, id: keyof typeof COLUMN_LABELS) {
  return helper.accessor((r) => r.totals[metric], {
    id,
    header: COLUMN_LABELS[id],
    sortDescFirst: true,
    cell: (c) => <span className="tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  });
}

function bandColumn(id: BandColumn) {
  return helper.accessor((r) => r.bands[id], {
    id,
    header: COLUMN_LABELS[id],
    sortDescFirst: true,
    cell: (c) => <span className="tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  });
}

function hasFlag(row: Row<Features, SquadRow>, _columnId: string, value: FlagFilter): boolean {
  return value === "any" ? row.original.flags.length > 0 : row.original.flags.some((f) => f.kind === value);
}

function inGroup(row: Row<Features, SquadRow>, _columnId: string, value: string): boolean {
  return (row.original.groupName ?? "") === value;
}

export const squadColumns = helper.columns([
  helper.accessor("name", {
    id: "name",
    header: COLUMN_LABELS.name,
    sortFn: "alphanumeric",
    enableHiding: false,
    cell: (c) => (
      <AthleteNameCell
        href={`/load/${c.row.original.id}`}
        name={c.getValue()}
        testId="athlete-link"
        className="whitespace-nowrap"
      >
        {c.row.original.missingDays > 0 ? (
          <span className="text-2xs text-flag-climb" data-testid="missing-note">
            {c.row.original.missingDays === 1
              ? "1 session not logged"
              : `${c.row.original.missingDays} sessions not logged`}
            {c.row.original.estimated ? " (plan counted, estimate)" : ""}
          </span>
        ) : null}
      </AthleteNameCell>
    ),
  }),
  helper.accessor((r) => r.ratio ?? undefined, {
    id: "ratio",
    header: COLUMN_LABELS.ratio,
    sortDescFirst: true,
    sortUndefined: "last",
    cell: (c) => <AcwrCell row={c.row.original} />,
  }),
  helper.accessor((r) => r.flags.length, {
    id: "flags",
    header: COLUMN_LABELS.flags,
    sortDescFirst: true,
    filterFn: hasFlag,
    cell: (c) => <FlagBadges flags={c.row.original.flags} />,
  }),
  metricColumn("hsrM", "hsrM"),
  metricColumn("nearMaxM", "nearMaxM"),
  metricColumn("sprintSteps", "sprintSteps"),
  metricColumn("contacts", "contacts"),
  helper.accessor((r) => r.contactsByIntensity.weighted, {
    id: "weightedContacts",
    header: COLUMN_LABELS.weightedContacts,
    sortDescFirst: true,
    cell: (c) => <span className="tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  }),
  ...BAND_COLUMNS.map(bandColumn),
  metricColumn("srpe", "srpe"),
  helper.accessor((r) => r.changePct[r.acwrMetric] ?? undefined, {
    id: "change",
    header: COLUMN_LABELS.change,
    sortDescFirst: true,
    sortUndefined: "last",
    cell: (c) => {
      const v = c.getValue();
      if (v === undefined) return <span className="text-ink-300">–</span>;
      const tone = v > 0 ? "text-ink-800" : "text-ink-500";
      return <span className={`tabular-nums ${tone}`}>{`${v > 0 ? "+" : ""}${formatNumber(v, 0)}%`}</span>;
    },
  }),
  helper.accessor((r) => r.groupName ?? "", {
    id: "group",
    header: COLUMN_LABELS.group,
    sortFn: "alphanumeric",
    filterFn: inGroup,
    cell: (c) => <span className="whitespace-nowrap text-ink-600">{c.getValue() || "–"}</span>,
  }),
]);

/** Plain values for the CSV export (numbers unrounded to one decimal, ratios to two). */
export function csvValue(row: SquadRow, columnId: string): string | number {
  switch (columnId) {
    case "name":
      return row.name;
    case "group":
      return row.groupName ?? "";
    case "ratio":
      return row.ratio === null ? "" : Number(row.ratio.toFixed(2));
    case "change": {
      const v = row.changePct[row.acwrMetric];
      return v === null ? "" : Number(v.toFixed(1));
    }
    case "flags":
      return row.flags.map((f) => f.reason).join(" | ");
    case "weightedContacts":
      return Number(row.contactsByIntensity.weighted.toFixed(1));
    case "absHsrM":
    case "absSprintM":
    case "relHsrM":
    case "relNearMaxM":
    case "relMaximalM":
      return Number(row.bands[columnId].toFixed(1));
    default:
      return Number((row.totals[columnId as Metric] ?? 0).toFixed(1));
  }
}
