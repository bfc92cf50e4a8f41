import { Badge } from "@/components/ui/badge";
import { LoadCaution } from "@/components/ui/caution";
import { FlagMark } from "@/components/ui/flag-mark";
import type { CoachTodayDto, TodaySession } from "@/lib/data/coach-today";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { formatNumber } from "@/lib/format/number";
import { figuresHref } from "@/lib/load/figures-link";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import type { FlagKind } from "@/lib/load/flags";
import { ALERT_KIND_LABEL } from "@/lib/notices/alert-display";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import { LogNoteLine, logNoteHref } from "@/components/status/log-note-line";
import { TodayItem, TodaySection } from "./today-section";

/** Alerts raised by a load flag show the flag's mark; the others (overrides, pain) their own words. */
const isFlagKind = (kind: string): kind is FlagKind => Object.prototype.hasOwnProperty.call(FLAG_DISPLAY, kind);

const planHref = (week: string) => `/plan?week=${week}`;

function SessionLine({ s, withDate }: { s: TodaySession; withDate?: boolean }) {
  return (
    <>
      {withDate ? null : <span className="w-11 shrink-0 text-ink-500 tabular-nums">{s.startTime}</span>}
      <span className="min-w-0 flex-1">
        <span className="block font-medium text-ink-900">{s.athleteName}</span>
        <span className="block truncate text-xs text-ink-600">
          {withDate ? `${formatDayLabel(s.date)} · ` : ""}
          {s.title}
        </span>
      </span>
      {s.status === "draft" ? (
        <Badge>Draft, not published</Badge>
      ) : s.logged ? (
        <Badge tone="steady">Logged</Badge>
      ) : (
        <Badge>Not logged</Badge>
      )}
    </>
  );
}

/** Long lists show their first few here; the rest are on the screen that handles them. */
const SHOWN = 6;

/** The coach's day: each list links to the screen where its items are handled. */
export function CoachToday({ data }: { data: CoachTodayDto }) {
  const published = data.sessions.filter((s) => s.status === "published");
  const logged = published.filter((s) => s.logged).length;
  const metric = METRIC_INFO[data.acwrMetric as Metric]?.short ?? data.acwrMetric;
  const week = planHref(data.weekStart);
  return (
    <div className="grid items-start gap-4 lg:grid-cols-2" data-testid="coach-today">
      <TodaySection
        id="sessions"
        title="Today's sessions"
        count={data.sessions.length}
        summary={`${logged} of ${published.length} logged`}
        more={{ href: week, label: "Week plan" }}
        empty="No sessions planned for today."
      >
        {data.sessions.map((s) => (
          <TodayItem key={s.id} href={week} testId="today-session">
            <SessionLine s={s} />
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="unlogged"
        title="Not logged earlier this week"
        count={data.unlogged.length}
        more={{ href: week, label: "Week plan" }}
        empty="Every past session of this week is logged."
      >
        {data.unlogged.map((s) => (
          <TodayItem key={s.id} href={`/load/${s.athleteId}`} testId="today-unlogged-session">
            <SessionLine s={s} withDate />
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="alerts"
        title="Open alerts"
        count={data.alertCount}
        more={{ href: "/alerts", label: "Alerts" }}
        empty="No open alerts."
      >
        {data.alerts.map((a) => (
          <TodayItem key={a.id} href="/alerts" testId="today-alert">
            {isFlagKind(a.kind) ? <FlagMark kind={a.kind} /> : <Badge>{ALERT_KIND_LABEL[a.kind]}</Badge>}
            <span className="font-medium text-ink-900">{a.athleteName}</span>
            {a.status === "acknowledged" ? <span className="text-xs text-ink-500">seen</span> : null}
            <span className="w-full text-xs text-ink-600">{a.reason}</span>
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="spikes"
        title="Spikes ahead in the next 7 days"
        count={data.spikes.length}
        more={{ href: figuresHref("spikes-ahead"), label: "How it is judged" }}
        empty={`No ACWR (${metric}) at or above ${formatNumber(data.spikeRatio, 2)} in the current plan.`}
      >
        {data.spikes.map((s) => (
          <TodayItem key={s.athleteId} href={planHref(s.weekStart)} testId="today-spike">
            <FlagMark kind="spike" />
            {s.provisional ? <span className="text-2xs text-ink-500">(early: under 28 days on record)</span> : null}
            <span className="font-medium text-ink-900">{s.athleteName}</span>
            <span className="text-ink-600">
              ACWR ({metric}) {s.ratio.toFixed(2)} on {formatDayLabel(s.date)}
            </span>
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="restrictions"
        title="Restrictions starting or ending this week"
        count={data.restrictions.length}
        empty="No restriction starts or ends this week."
      >
        {data.restrictions.map((r) => (
          <TodayItem key={`${r.id}-${r.change}`} href={`/squad/${r.athleteId}`} testId="today-restriction">
            <Badge tone={r.change === "starts" ? "note" : "neutral"}>
              {r.change === "starts" ? "Starts" : "Ends"} {formatDayLabel(r.date)}
            </Badge>
            <span className="font-medium text-ink-900">{r.athleteName}</span>
            <span className="w-full text-xs text-ink-600">{r.description}</span>
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="retests"
        title="Due a speed re-test"
        count={data.retests.length}
        more={{ href: "/squad", label: "Squad" }}
        empty={`Every athlete had a timing test in the last ${data.retestWeeks} weeks.`}
      >
        {data.retests.slice(0, SHOWN).map((r) => (
          <TodayItem key={r.athleteId} href={`/squad/${r.athleteId}`} testId="today-retest">
            <span className="font-medium text-ink-900">{r.athleteName}</span>
            <span className="text-ink-600">
              {r.lastTestedOn
                ? `last tested ${formatDayLabel(r.lastTestedOn)} (${r.daysSince} days ago)`
                : "never tested"}
            </span>
          </TodayItem>
        ))}
        {data.retests.length > SHOWN ? (
          <TodayItem href="/squad">
            <span className="text-ink-600">and {data.retests.length - SHOWN} more on the squad page</span>
          </TodayItem>
        ) : null}
      </TodaySection>

      <TodaySection
        id="notes"
        title="Notes from athletes"
        count={data.notes.length}
        more={{ href: "/status", label: "Squad status" }}
        empty="No notes on the logs of the last 7 days."
      >
        {data.notes.map((n) => (
          <TodayItem key={n.sessionId} href={logNoteHref(n)} testId="today-note">
            <LogNoteLine note={n} />
          </TodayItem>
        ))}
      </TodaySection>

      <div className="lg:col-span-2">
        <LoadCaution />
      </div>
    </div>
  );
}
