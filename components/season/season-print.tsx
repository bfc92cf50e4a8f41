import { FlagMark } from "@/components/ui/flag-mark";
import { SEASON_PHASE_LABELS } from "@/lib/domain/season";
import type { SeasonViewDto } from "@/lib/data/season-view";
import { addDays, shiftWeek } from "@/lib/dates/plain-date";
import { formatDayShort } from "@/lib/format/dates";
import { formatNumber } from "@/lib/format/number";
import { LOAD_CAUTION } from "@/lib/load/flag-display";
import { phaseOfWeek } from "@/lib/season/season-grid";

/** Weeks per printed table: eight columns of figures stay legible on A4 landscape beside the names. */
const PRINT_WEEKS_PER_PAGE = 8;

const TARGET_WORD = { hsrM: "HSR", nearMaxM: "near-max", contacts: "contacts", srpe: "sRPE" } as const;

/**
 * The season on paper (only in print; the screen grid is hidden there): the weeks in pages of eight, every
 * athlete on each page, each week's ratio, sRPE and HSR metres, flags and targets missed written out whole, the
 * phase in force above each week, and the caution under every page.
 */
export function SeasonPrint({ view }: { view: SeasonViewDto }) {
  const pages: SeasonViewDto["weeks"][] = [];
  for (let i = 0; i < view.weeks.length; i += PRINT_WEEKS_PER_PAGE)
    pages.push(view.weeks.slice(i, i + PRINT_WEEKS_PER_PAGE));
  const last = addDays(shiftWeek(view.from, view.weeks.length - 1), 6);
  return (
    <div className="hidden text-ink-900 print:block" data-testid="season-print">
      {pages.map((weeks, page) => (
        <section
          key={weeks[0].weekStart}
          className={page > 0 ? "break-before-page" : undefined}
          data-testid="season-print-page"
        >
          <h2 className="mb-2 text-base font-semibold">
            Season plan · {formatDayShort(view.from)} to {formatDayShort(last)}
            <span className="font-normal text-ink-700">
              {" "}
              · page {page + 1} of {pages.length}
            </span>
          </h2>
          <table className="w-full table-fixed border-collapse text-2xs">
            <thead>
              <tr>
                <th scope="col" className="w-28 border border-ink-300 px-1 py-0.5 text-left">
                  Athlete
                </th>
                {weeks.map((w) => {
                  const phase = phaseOfWeek(view.phases, null, w.weekStart);
                  return (
                    <th key={w.weekStart} scope="col" className="border border-ink-300 px-1 py-0.5 text-left">
                      Wk {w.isoWeek} · {formatDayShort(w.weekStart)}
                      {phase ? (
                        <span className="block font-normal">
                          {phase.name} ({SEASON_PHASE_LABELS[phase.kind]})
                        </span>
                      ) : null}
                      {view.meets
                        .filter((m) => m.date >= w.weekStart && m.date <= addDays(w.weekStart, 6))
                        .map((m) => (
                          <span key={m.id} className="block font-normal">
                            Meet {m.priority}: {m.name}
                          </span>
                        ))}
                    </th>
                  );
                })}
              </tr>
            </thead>
            <tbody>
              {view.athletes.map((a) => (
                <tr key={a.id} className="break-inside-avoid" data-testid="season-print-row">
                  <th scope="row" className="border border-ink-300 px-1 py-0.5 text-left font-medium">
                    {a.name}
                    {a.groupName ? <span className="block font-normal text-ink-700">{a.groupName}</span> : null}
                  </th>
                  {weeks.map((w) => {
                    const cell = a.cells.find((c) => c.weekStart === w.weekStart)!;
                    const off = cell.targets.filter((t) => t.standing !== "within");
                    return (
                      <td key={w.weekStart} className="border border-ink-300 px-1 py-0.5 align-top">
                        <span className="block font-semibold tabular-nums">
                          {cell.ratio === null ? "–" : cell.ratio.toFixed(2)}
                          {cell.past ? <span className="font-normal"> logged</span> : null}
                        </span>
                        <span className="block tabular-nums">
                          {formatNumber(cell.totals.srpe, 0)} sRPE · {formatNumber(cell.totals.hsrM, 0)} m
                        </span>
                        {cell.flagKinds.map((k) => (
                          <FlagMark key={k} kind={k} className="flex" />
                        ))}
                        {off.map((t) => (
                          <span key={t.metric} className="block">
                            {TARGET_WORD[t.metric]} {t.standing === "below" ? "under" : "over"} target
                          </span>
                        ))}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-2xs text-ink-700">
            Ratio: acute:chronic workload ratio of the week&apos;s last day. Caution · {LOAD_CAUTION}
          </p>
        </section>
      ))}
    </div>
  );
}
