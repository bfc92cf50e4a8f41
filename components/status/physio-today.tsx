import { AlertsSection, NotesSection, RestrictionsSection, SpikesSection } from "@/components/coach/today-lists";
import { TodayItem, TodaySection } from "@/components/coach/today-section";
import { Badge } from "@/components/ui/badge";
import { LoadCaution } from "@/components/ui/caution";
import type { PhysioTodayDto } from "@/lib/data/physio-today";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import { AvailabilityBadge } from "./availability-badge";

/** The medical view of one athlete: where alerts are acknowledged and resolved, logs read and levels set. */
const statusHref = (x: { athleteId: number }) => `/status/${x.athleteId}`;

/**
 * The physio's day: open alerts (pain first), pain reports, who is not on full training, sessions planned against a
 * restriction, and the week's restrictions, spikes and notes; each line opens the athlete's status page.
 */
export function PhysioToday({ data }: { data: PhysioTodayDto }) {
  const { day } = data;
  return (
    <div className="grid items-start gap-4 lg:grid-cols-2" data-testid="physio-today">
      <AlertsSection data={day} hrefOf={statusHref} />

      <TodaySection
        id="pains"
        title="Pain reports, last 7 days"
        count={data.pains.length}
        more={{ href: "/status", label: "Squad status" }}
        empty="No athlete reported pain in the last 7 days."
      >
        {data.pains.map((p) => (
          <TodayItem
            key={p.id}
            href={p.sessionId ? `/status/${p.athleteId}#session-${p.sessionId}` : statusHref(p)}
            testId="today-pain"
          >
            <span className="font-medium text-ink-900">{p.athleteName}</span>
            <Badge tone={p.severity >= 4 ? "spike" : "climb"}>
              {BODY_REGION_LABEL[p.region]} {p.severity}/10
            </Badge>
            <span className="text-xs text-ink-600">
              {formatDayLabel(p.date)}
              {p.stoppedSession ? " · stopped the session" : ""}
            </span>
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="levels"
        title="Not on full training"
        count={data.away.length}
        empty="Every athlete is on full training."
      >
        {data.away.map((a) => (
          <TodayItem key={a.athleteId} href={statusHref(a)} testId="today-away">
            <span className="font-medium text-ink-900">{a.athleteName}</span>
            <AvailabilityBadge level={a.level} />
            {a.returnOn ? <span className="text-xs text-ink-600">back {formatDayLabel(a.returnOn)}</span> : null}
            {a.note ? <span className="w-full text-xs break-words text-ink-600">{a.note}</span> : null}
          </TodayItem>
        ))}
      </TodaySection>

      <TodaySection
        id="conflicts"
        title="Planned against a restriction"
        count={data.conflicts.length}
        empty="No planned session breaks a restriction."
      >
        {data.conflicts.map((c) => (
          <TodayItem key={`${c.sessionId}-${c.restrictionId}`} href={statusHref(c)} testId="today-conflict">
            <span className="font-medium text-ink-900">{c.athleteName}</span>
            <span className="text-xs text-ink-600">
              {formatDayLabel(c.date)} · {c.title}
              {c.status === "draft" ? " (draft)" : ""}
            </span>
            <span className="w-full text-xs text-flag-spike">
              {c.rule}: {c.detail}
            </span>
          </TodayItem>
        ))}
      </TodaySection>

      <RestrictionsSection data={day} hrefOf={statusHref} />
      <SpikesSection data={day} hrefOf={statusHref} />
      <NotesSection notes={day.notes} />

      <div className="lg:col-span-2">
        <LoadCaution />
      </div>
    </div>
  );
}
