import { FeedCard } from "@/components/calendar/feed-card";
import { MyRestrictions } from "@/components/restrictions/my-restrictions";
import { EmptyState, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { getCalendarFeedStatus, listAthleteSessions, type AthleteSession } from "@/lib/data/calendar-tokens";
import { teamToday } from "@/lib/dates/zoned";
import { formatDayShort } from "@/lib/format/dates";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { SessionCard } from "./session-card";

export const metadata = { title: "My training" };
export const dynamic = "force-dynamic";

function Week({
  title,
  from,
  sessions,
  today,
  testId,
}: {
  title: string;
  from: string;
  sessions: AthleteSession[];
  today: string;
  testId: string;
}) {
  return (
    <section data-testid={testId}>
      <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">
        {title} <span className="font-normal tracking-normal normal-case">· from {formatDayShort(from)}</span>
      </h2>
      {sessions.length === 0 ? (
        <EmptyState title="No sessions published yet">Your coach&apos;s plan shows up here once it is sent.</EmptyState>
      ) : (
        <div className="space-y-3">
          {sessions.map((s) => (
            <SessionCard key={s.id} session={s} today={today} />
          ))}
        </div>
      )}
    </section>
  );
}

export default async function MyTrainingPage() {
  const viewer = await pageViewer("log:write", "own");
  if (!viewer.athleteId) {
    return (
      <>
        <PageHeader title="My training" />
        <EmptyState title="This screen is for athletes">
          Your account has no athlete profile in {viewer.teamName}. Plans are on the week plan screen.
        </EmptyState>
      </>
    );
  }
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const thisWeek = startOfWeek(today, viewer.weekStartDay);
  const nextWeek = addDays(thisWeek, 7);
  const [sessions, feed] = await Promise.all([
    listAthleteSessions({
      teamId: viewer.teamId,
      athleteId: viewer.athleteId,
      from: thisWeek,
      to: addDays(nextWeek, 6),
    }),
    getCalendarFeedStatus({ athleteId: viewer.athleteId }),
  ]);
  return (
    <>
      <PageHeader
        title="My training"
        lead="This week and next, as your coach published them. Log each session after you did it."
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-6">
          <MyRestrictions teamId={viewer.teamId} athleteId={viewer.athleteId} today={today} />
          <Week
            title="This week"
            from={thisWeek}
            sessions={sessions.filter((s) => s.date < nextWeek)}
            today={today}
            testId="week-this"
          />
          <Week
            title="Next week"
            from={nextWeek}
            sessions={sessions.filter((s) => s.date >= nextWeek)}
            today={today}
            testId="week-next"
          />
        </div>
        <aside>
          <FeedCard athleteId={viewer.athleteId} initial={feed} />
        </aside>
      </div>
    </>
  );
}
