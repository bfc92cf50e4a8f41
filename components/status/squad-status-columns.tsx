"use client";

import { createColumnHelper, tableFeatures, type Row } from "@tanstack/react-table";
import { AcwrCell } from "@/components/load/acwr-cell";
import { FlagBadges } from "@/components/load/flag-badge";
import { Badge } from "@/components/ui/badge";
import { AthleteNameCell, sortAndFilterFeatures } from "@/components/ui/sort-table";
import { AVAILABILITY_LEVELS, type AvailabilityLevel } from "@/lib/availability/levels";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import type { SquadStatusRow } from "@/lib/data/squad-status";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { AvailabilityBadge } from "./availability-badge";

export const statusFeatures = tableFeatures(sortAndFilterFeatures());
type Features = typeof statusFeatures;
const helper = createColumnHelper<Features, SquadStatusRow>();

export const STATUS_COLUMN_LABELS: Record<string, string> = {
  name: "Athlete",
  level: "Availability",
  restrictions: "Restrictions",
  alerts: "Open alerts",
  note: "Latest log note",
  pain: "Latest pain report",
  checkIn: "Latest check-in",
  ratio: "ACWR this week",
  flags: "Flags",
};

/** Filter values: a level, or "attention" (open alerts or sessions against a restriction). */
export type AttentionFilter = "attention";

function levelIs(row: Row<Features, SquadStatusRow>, _id: string, value: AvailabilityLevel): boolean {
  return row.original.level === value;
}
function needsAttention(row: Row<Features, SquadStatusRow>, _id: string, value: AttentionFilter | undefined) {
  return value !== "attention" || row.original.openAlerts > 0 || row.original.conflicts > 0;
}
function nameHas(row: Row<Features, SquadStatusRow>, _id: string, value: string): boolean {
  return row.original.name.toLowerCase().includes(value.trim().toLowerCase());
}

export const statusColumns = helper.columns([
  helper.accessor("name", {
    id: "name",
    header: STATUS_COLUMN_LABELS.name,
    sortFn: "alphanumeric",
    filterFn: nameHas,
    cell: (c) => (
      <AthleteNameCell href={`/status/${c.row.original.id}`} name={c.getValue()} testId="status-athlete-link">
        {c.row.original.groupName ? <span className="text-xs text-ink-500">{c.row.original.groupName}</span> : null}
      </AthleteNameCell>
    ),
  }),
  helper.accessor((r) => AVAILABILITY_LEVELS.indexOf(r.level), {
    id: "level",
    header: STATUS_COLUMN_LABELS.level,
    sortDescFirst: true,
    filterFn: levelIs,
    cell: (c) => {
      const a = c.row.original.availability;
      return (
        <span className="flex flex-col items-start gap-0.5">
          <AvailabilityBadge level={c.row.original.level} />
          {c.row.original.level !== "full" && a?.returnOn ? (
            <span className="text-xs text-ink-500">back {formatDayLabel(a.returnOn)}</span>
          ) : null}
        </span>
      );
    },
  }),
  helper.accessor((r) => r.restrictions.length, {
    id: "restrictions",
    header: STATUS_COLUMN_LABELS.restrictions,
    sortDescFirst: true,
    cell: (c) => {
      const r = c.row.original;
      if (r.restrictions.length === 0 && r.conflicts === 0) return <span className="text-ink-500">None</span>;
      return (
        <span className="flex flex-col gap-1">
          {r.restrictions.map((x) => (
            <span key={x} className="text-ink-800">
              {x}
            </span>
          ))}
          {r.conflicts > 0 ? (
            <Badge tone="spike" className="self-start">
              {r.conflicts === 1 ? "1 planned session breaks it" : `${r.conflicts} planned sessions break them`}
            </Badge>
          ) : null}
        </span>
      );
    },
  }),
  helper.accessor((r) => r.openAlerts + r.conflicts, {
    id: "alerts",
    header: STATUS_COLUMN_LABELS.alerts,
    sortDescFirst: true,
    filterFn: needsAttention,
    cell: (c) =>
      c.row.original.openAlerts > 0 ? (
        <Badge tone="spike">{c.row.original.openAlerts} open</Badge>
      ) : (
        <span className="text-ink-500">None</span>
      ),
  }),
  helper.accessor((r) => r.latestNote?.date ?? "", {
    id: "note",
    header: STATUS_COLUMN_LABELS.note,
    sortDescFirst: true,
    cell: (c) => {
      const n = c.row.original.latestNote;
      if (!n) return <span className="text-ink-500">None</span>;
      return (
        <span className="block max-w-xs">
          <span className="text-xs text-ink-500">
            {formatDayLabel(n.date)} · {n.title}
          </span>
          <span className="block text-ink-900">&ldquo;{n.note}&rdquo;</span>
        </span>
      );
    },
  }),
  helper.accessor((r) => r.latestPain?.date ?? "", {
    id: "pain",
    header: STATUS_COLUMN_LABELS.pain,
    sortDescFirst: true,
    cell: (c) => {
      const p = c.row.original.latestPain;
      if (!p) return <span className="text-ink-500">None</span>;
      return (
        <span className="flex flex-col items-start gap-0.5">
          <Badge tone={p.severity >= 4 ? "spike" : "climb"}>
            {BODY_REGION_LABEL[p.region]} {p.severity}/10
          </Badge>
          <span className="text-xs text-ink-500">
            {formatDayLabel(p.date)}
            {p.stoppedSession ? " · stopped the session" : ""}
          </span>
        </span>
      );
    },
  }),
  helper.accessor((r) => r.latestCheckIn?.date ?? "", {
    id: "checkIn",
    header: STATUS_COLUMN_LABELS.checkIn,
    sortDescFirst: true,
    cell: (c) => {
      const k = c.row.original.latestCheckIn;
      if (!k) return <span className="text-ink-500">None</span>;
      return (
        <span className="flex flex-col">
          <span className="text-ink-900 tabular-nums">{k.total}/25</span>
          <span className="text-xs text-ink-500">{formatDayLabel(k.date)}</span>
        </span>
      );
    },
  }),
  helper.accessor((r) => r.ratio ?? undefined, {
    id: "ratio",
    header: STATUS_COLUMN_LABELS.ratio,
    sortDescFirst: true,
    sortUndefined: "last",
    cell: (c) => <AcwrCell row={c.row.original} />,
  }),
  helper.accessor((r) => r.flags.length, {
    id: "flags",
    header: STATUS_COLUMN_LABELS.flags,
    sortDescFirst: true,
    cell: (c) => <FlagBadges flags={c.row.original.flags} />,
  }),
]);
