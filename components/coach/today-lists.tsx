import { Badge } from "@/components/ui/badge";
import { FlagMark } from "@/components/ui/flag-mark";
import { LogNoteLine, logNoteHref } from "@/components/status/log-note-line";
import type { CoachTodayDto, TodayAlert, TodayRestriction, TodaySpike } from "@/lib/data/coach-today";
import type { LogNote } from "@/lib/data/log-notes";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { formatNumber } from "@/lib/format/number";
import { figuresHref } from "@/lib/load/figures-link";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import type { FlagKind } from "@/lib/load/flags";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import { ALERT_KIND_LABEL } from "@/lib/notices/alert-display";
import { TodayItem, TodaySection } from "./today-section";

// The lists the coach's and the physio's days share; each day links an item to the screen where that role handles it.

/** Alerts raised by a load flag show the flag's mark; the others (overrides, pain) their own words. */
const isFlagKind = (kind: string): kind is FlagKind => Object.prototype.hasOwnProperty.call(FLAG_DISPLAY, kind);

type Day = Pick<CoachTodayDto, "alerts" | "alertCount" | "spikes" | "spikeRatio" | "acwrMetric" | "restrictions">;

export function AlertsSection({ data, hrefOf }: { data: Day; hrefOf: (a: TodayAlert) => string }) {
  return (
    <TodaySection
      id="alerts"
      title="Open alerts"
      count={data.alertCount}
      more={{ href: "/alerts", label: "Alerts" }}
      empty="No open alerts."
    >
      {data.alerts.map((a) => (
        <TodayItem key={a.id} href={hrefOf(a)} testId="today-alert">
          {isFlagKind(a.kind) ? <FlagMark kind={a.kind} /> : <Badge>{ALERT_KIND_LABEL[a.kind]}</Badge>}
          <span className="font-medium text-ink-900">{a.athleteName}</span>
          {a.status === "acknowledged" ? <span className="text-xs text-ink-500">seen</span> : null}
          <span className="w-full text-xs text-ink-600">{a.reason}</span>
        </TodayItem>
      ))}
    </TodaySection>
  );
}

export function SpikesSection({ data, hrefOf }: { data: Day; hrefOf: (s: TodaySpike) => string }) {
  const metric = METRIC_INFO[data.acwrMetric as Metric]?.short ?? data.acwrMetric;
  return (
    <TodaySection
      id="spikes"
      title="Spikes ahead in the next 7 days"
      count={data.spikes.length}
      more={{ href: figuresHref("spikes-ahead"), label: "How it is judged" }}
      empty={`No ACWR (${metric}) at or above ${formatNumber(data.spikeRatio, 2)} in the current plan.`}
    >
      {data.spikes.map((s) => (
        <TodayItem key={s.athleteId} href={hrefOf(s)} testId="today-spike">
          <FlagMark kind="spike" />
          {s.provisional ? <span className="text-2xs text-ink-500">(early: under 28 days on record)</span> : null}
          <span className="font-medium text-ink-900">{s.athleteName}</span>
          <span className="text-ink-600">
            ACWR ({metric}) {s.ratio.toFixed(2)} on {formatDayLabel(s.date)}
          </span>
        </TodayItem>
      ))}
    </TodaySection>
  );
}

export function RestrictionsSection({ data, hrefOf }: { data: Day; hrefOf: (r: TodayRestriction) => string }) {
  return (
    <TodaySection
      id="restrictions"
      title="Restrictions starting or ending this week"
      count={data.restrictions.length}
      empty="No restriction starts or ends this week."
    >
      {data.restrictions.map((r) => (
        <TodayItem key={`${r.id}-${r.change}`} href={hrefOf(r)} testId="today-restriction">
          <Badge tone={r.change === "starts" ? "note" : "neutral"}>
            {r.change === "starts" ? "Starts" : "Ends"} {formatDayLabel(r.date)}
          </Badge>
          <span className="font-medium text-ink-900">{r.athleteName}</span>
          <span className="w-full text-xs text-ink-600">{r.description}</span>
        </TodayItem>
      ))}
    </TodaySection>
  );
}

export function NotesSection({ notes }: { notes: readonly LogNote[] }) {
  return (
    <TodaySection
      id="notes"
      title="Notes from athletes"
      count={notes.length}
      more={{ href: "/status", label: "Squad status" }}
      empty="No notes on the logs of the last 7 days."
    >
      {notes.map((n) => (
        <TodayItem key={n.sessionId} href={logNoteHref(n)} testId="today-note">
          <LogNoteLine note={n} />
        </TodayItem>
      ))}
    </TodaySection>
  );
}
