import { Badge } from "@/components/ui/badge";
import { LoadCaution } from "@/components/ui/caution";
import type { CoachTodayDto, TodaySession } from "@/lib/data/coach-today";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { AlertsSection, NotesSection, RestrictionsSection, SpikesSection } from "./today-lists";
import { TodayItem, TodaySection } from "./today-section";

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

      <AlertsSection data={data} hrefOf={() => "/alerts"} />
      <SpikesSection data={data} hrefOf={(s) => planHref(s.weekStart)} />
      <RestrictionsSection data={data} hrefOf={(r) => `/squad/${r.athleteId}`} />

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

      <NotesSection notes={data.notes} />

      <div className="lg:col-span-2">
        <LoadCaution />
      </div>
    </div>
  );
}
