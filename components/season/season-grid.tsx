import { clsx } from "clsx";
import Link from "next/link";
import { FlagMark } from "@/components/ui/flag-mark";
import { SEASON_PHASE_LABELS } from "@/lib/domain/season";
import type { SeasonViewDto } from "@/lib/data/season-view";
import { formatDayShort } from "@/lib/format/dates";
import { formatNumber } from "@/lib/format/number";
import { METRIC_INFO } from "@/lib/load/types";
import type { SeasonCell } from "@/lib/season/season-grid";
import type { TargetCheck } from "@/lib/season/targets";

type Athlete = SeasonViewDto["athletes"][number];

const TARGET_LABEL = { hsrM: "HSR", nearMaxM: "Near-max", contacts: "Contacts", srpe: "sRPE" } as const;
const STANDING_WORD = { below: "under target", above: "over target", within: "on target" } as const;

/** Consecutive weeks under the same team-wide phase, for one merged header cell each. */
function phaseSpans(view: SeasonViewDto) {
  const spans: { phaseId: number | null; weeks: number }[] = [];
  for (const { weekStart } of view.weeks) {
    const phase = view.phases.find((p) => p.groupId === null && p.startsOn <= weekStart && p.endsOn >= weekStart);
    const id = phase?.id ?? null;
    const last = spans[spans.length - 1];
    if (last && last.phaseId === id) last.weeks++;
    else spans.push({ phaseId: id, weeks: 1 });
  }
  return spans;
}

function meetsInWeek(view: SeasonViewDto, weekStart: string, weekEnd: string) {
  return view.meets.filter((m) => m.date >= weekStart && m.date <= weekEnd);
}

/** Whom a meet is for, when not the whole team. */
function meetAudience(view: SeasonViewDto, meet: SeasonViewDto["meets"][number]): string | null {
  if (meet.athleteId !== null) return view.athletes.find((a) => a.id === meet.athleteId)?.name ?? null;
  if (meet.groupId !== null) return view.groups.find((g) => g.id === meet.groupId)?.name ?? null;
  return null;
}

function TargetMarks({ checks }: { checks: TargetCheck[] }) {
  const off = checks.filter((c) => c.standing !== "within");
  if (checks.length === 0) return null;
  if (off.length === 0) return <span className="text-2xs text-ink-600">On target</span>;
  return (
    <span className="flex flex-col text-2xs font-medium text-ink-800">
      {off.map((c) => (
        <span key={c.metric} data-testid="off-target" data-metric={c.metric} data-standing={c.standing}>
          {c.standing === "below" ? "▼" : "▲"} {TARGET_LABEL[c.metric]} {STANDING_WORD[c.standing]}
        </span>
      ))}
    </span>
  );
}

function Cell({ cell, metricShort, weekEnd }: { cell: SeasonCell; metricShort: string; weekEnd: string }) {
  const flag = cell.flagKinds[0];
  return (
    <td
      className={clsx(
        "border-l border-ink-100 p-0 align-top",
        cell.past && "bg-paper-sunk/60",
        cell.preview && "outline-2 -outline-offset-2 outline-state-draft outline-dashed",
      )}
    >
      <Link
        href={`/plan?week=${cell.weekStart}`}
        data-testid="season-cell"
        data-week={cell.weekStart}
        data-ratio={cell.ratio ?? ""}
        data-flags={cell.flagKinds.join(" ")}
        data-preview={cell.preview ? "true" : undefined}
        className="flex min-h-16 min-w-24 flex-col gap-0.5 px-2 py-1.5 hover:bg-lane-50 focus-visible:outline-2"
      >
        <span className="sr-only">
          Week of {formatDayShort(cell.weekStart)} to {formatDayShort(weekEnd)}:
        </span>
        <span className="text-sm font-semibold text-ink-900 tabular-nums">
          {cell.ratio === null ? "–" : cell.ratio.toFixed(2)}
          <span className="sr-only"> ratio</span>
          {cell.ratioProvisional ? <span className="text-2xs font-normal text-ink-600"> early</span> : null}
        </span>
        <span className="text-2xs text-ink-600 tabular-nums">
          {formatNumber(cell.totals.srpe, 0)} sRPE · {formatNumber(cell.totals.hsrM, 0)} m
          <span className="sr-only"> high-speed running, {metricShort} is the ratio metric</span>
        </span>
        {flag ? <FlagMark kind={flag} /> : null}
        <TargetMarks checks={cell.targets} />
        {cell.past ? <span className="text-2xs text-ink-600">logged</span> : null}
        {cell.preview ? <span className="text-2xs font-medium text-ink-700">not written yet</span> : null}
      </Link>
    </td>
  );
}

function AthleteRow({ athlete, view }: { athlete: Athlete; view: SeasonViewDto }) {
  const metricShort = METRIC_INFO[view.settings.acwrMetric].short;
  return (
    <tr data-testid="season-row" data-athlete-id={athlete.id} className="border-t border-ink-100">
      <th
        scope="row"
        className="sticky left-0 z-10 bg-paper-raised px-3 py-2 text-left text-sm font-medium text-ink-900"
      >
        <Link href={`/load/${athlete.id}`} className="hover:underline">
          {athlete.name}
        </Link>
        {athlete.warnings.length > 0 ? (
          <span className="mt-0.5 block text-2xs font-medium text-flag-jump" data-testid="row-warning-count">
            {athlete.warnings.length} to check
          </span>
        ) : null}
      </th>
      {athlete.cells.map((cell) => (
        <Cell key={cell.weekStart} cell={cell} metricShort={metricShort} weekEnd={addWeekEnd(cell.weekStart)} />
      ))}
    </tr>
  );
}

const addWeekEnd = (weekStart: string) => {
  const d = new Date(`${weekStart}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + 6);
  return d.toISOString().slice(0, 10);
};

/** Weeks across, athletes (by group) down; phases and meets drawn above the weeks. */
export function SeasonGrid({ view }: { view: SeasonViewDto }) {
  const phaseById = new Map(view.phases.map((p) => [p.id, p]));
  const groups = [
    ...view.groups.map((g) => ({
      key: String(g.id),
      name: g.name,
      rows: view.athletes.filter((a) => a.groupId === g.id),
      // The group's own phases; its weeks follow them over the team's (lib/season/season-grid.ts phaseOfWeek).
      phases: view.phases.filter((p) => p.groupId === g.id),
    })),
    { key: "none", name: "No group", rows: view.athletes.filter((a) => a.groupId === null), phases: [] },
  ].filter((g) => g.rows.length > 0);
  return (
    // relative: the cells' sr-only labels are placed absolutely; outside a positioned box they widen the page.
    <div
      className="relative max-w-full overflow-x-auto rounded-xl bg-paper-raised ring-1 ring-ink-100"
      data-testid="season-grid"
    >
      <table className="min-w-full border-collapse text-left">
        <caption className="sr-only">
          Season: each athlete&apos;s weekly ratio, load and targets; weeks across, athletes down
        </caption>
        <thead>
          <tr>
            <th scope="col" className="sticky left-0 z-10 bg-paper-raised px-3 py-2 text-xs font-semibold text-ink-700">
              Athlete
            </th>
            {view.weeks.map((w) => (
              <th
                key={w.weekStart}
                scope="col"
                className={clsx(
                  "border-l border-ink-100 px-2 py-2 text-xs font-semibold text-ink-700",
                  w.weekStart === view.currentWeekStart && "bg-lane-50",
                )}
              >
                <Link href={`/plan?week=${w.weekStart}`} className="hover:underline" data-testid="season-week">
                  Wk {w.isoWeek}
                  <span className="block font-normal text-ink-600">{formatDayShort(w.weekStart)}</span>
                </Link>
              </th>
            ))}
          </tr>
          <tr data-testid="season-phases">
            <th
              scope="row"
              className="sticky left-0 z-10 bg-paper-raised px-3 py-1 text-2xs font-semibold text-ink-700"
            >
              Phase
            </th>
            {phaseSpans(view).map((s, i) => {
              const phase = s.phaseId === null ? null : phaseById.get(s.phaseId);
              return (
                <td key={i} colSpan={s.weeks} className="border-l border-ink-100 px-2 py-1 text-2xs text-ink-800">
                  {phase ? (
                    <span className="block truncate rounded bg-ink-100 px-1.5 py-0.5 font-medium" title={phase.goal}>
                      {phase.name} · {SEASON_PHASE_LABELS[phase.kind]}
                    </span>
                  ) : null}
                </td>
              );
            })}
          </tr>
          <tr data-testid="season-meets">
            <th
              scope="row"
              className="sticky left-0 z-10 bg-paper-raised px-3 py-1 text-2xs font-semibold text-ink-700"
            >
              Meets
            </th>
            {view.weeks.map((w) => (
              <td key={w.weekStart} className="border-l border-ink-100 px-2 py-1 text-2xs text-ink-800">
                {meetsInWeek(view, w.weekStart, addWeekEnd(w.weekStart)).map((m) => {
                  const audience = meetAudience(view, m);
                  return (
                    <span key={m.id} className="block font-medium" data-testid="season-meet">
                      <span className="rounded bg-ink-800 px-1 text-paper-raised">{m.priority}</span> {m.name}
                      {audience ? <span className="font-normal text-ink-600"> · {audience}</span> : null}
                    </span>
                  );
                })}
              </td>
            ))}
          </tr>
        </thead>
        {groups.map((g) => (
          <tbody key={g.key}>
            <tr className="border-t-2 border-ink-200 bg-paper-sunk">
              <th
                scope="rowgroup"
                colSpan={view.weeks.length + 1}
                className="px-3 py-1 text-xs font-semibold text-ink-700"
              >
                {g.name}
                {g.phases.map((p) => (
                  <span key={p.id} className="ml-2 font-normal text-ink-700" data-testid="group-phase">
                    · {p.name} ({SEASON_PHASE_LABELS[p.kind]}), {formatDayShort(p.startsOn)} to{" "}
                    {formatDayShort(p.endsOn)}
                  </span>
                ))}
              </th>
            </tr>
            {g.rows.map((a) => (
              <AthleteRow key={a.id} athlete={a} view={view} />
            ))}
          </tbody>
        ))}
      </table>
    </div>
  );
}
