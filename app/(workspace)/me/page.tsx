import Link from "next/link";
import { CheckInCard } from "@/components/athlete/check-in-card";
import { CheckInTrend } from "@/components/athlete/check-in-trend";
import { getMyLoad } from "@/components/athlete/my-load";
import { MyLoadCards } from "@/components/athlete/my-load-cards";
import { listMySessions } from "@/components/athlete/my-sessions";
import { myWeeks } from "@/components/athlete/my-weeks";
import { TodayCard, WeekList } from "@/components/athlete/today-card";
import { FeedCard } from "@/components/calendar/feed-card";
import { MyRestrictions } from "@/components/restrictions/my-restrictions";
import { EmptyState, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { getAthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { getCalendarFeedStatus } from "@/lib/data/calendar-tokens";
import { listCheckIns } from "@/lib/data/check-ins";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { formatDayShort } from "@/lib/format/dates";

export const metadata = { title: "My training" };
export const dynamic = "force-dynamic";

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
  const athleteId = viewer.athleteId;
  const now = new Date();
  const today = teamToday({ timeZone: viewer.timeZone, now });
  const { thisWeek, nextWeek, end } = myWeeks(today, viewer.weekStartDay);
  const [sessions, feed, settings, checkIns, load] = await Promise.all([
    listMySessions({
      teamId: viewer.teamId,
      athleteId,
      from: thisWeek,
      to: end,
      today,
      timeZone: viewer.timeZone,
      now,
    }),
    getCalendarFeedStatus({ athleteId }),
    getAthleteReportSettings({ teamId: viewer.teamId }),
    listCheckIns({ athleteId, from: addDays(today, -27), to: today }),
    getMyLoad({
      teamId: viewer.teamId,
      athleteId,
      today,
      timeZone: viewer.timeZone,
      weekStartDay: viewer.weekStartDay,
    }),
  ]);
  const hero =
    sessions.find((s) => s.date === today && s.status !== "cancelled") ??
    sessions.find((s) => s.date >= today && s.status === "published");
  const rest = sessions.filter((s) => s !== hero);
  const todays = checkIns.find((c) => c.date === today) ?? null;
  return (
    <>
      <PageHeader
        title="My training"
        lead="Today first, then the rest of this week and next as your coach sent them."
      />
      <div className="grid gap-5 lg:grid-cols-[1fr_22rem]">
        <div className="min-w-0 space-y-5">
          {settings.checkInsEnabled ? <CheckInCard athleteId={athleteId} today={todays} /> : null}
          <MyRestrictions teamId={viewer.teamId} athleteId={athleteId} today={today} />
          {hero ? (
            <TodayCard session={hero} today={today} />
          ) : (
            <EmptyState title="No sessions ahead yet">Your coach&apos;s plan shows up here once it is sent.</EmptyState>
          )}
          <section aria-label="My load this week" className="space-y-2">
            <div className="flex items-baseline justify-between">
              <h2 className="text-sm font-semibold tracking-wider text-ink-500 uppercase">My load this week</h2>
              <Link href="/me/load" className="text-sm font-medium text-lane-700 underline" data-testid="my-load-link">
                See the trend
              </Link>
            </div>
            <MyLoadCards load={load} compact />
          </section>
          <WeekList
            title={`This week · from ${formatDayShort(thisWeek)}`}
            sessions={rest.filter((s) => s.date < nextWeek)}
            today={today}
            testId="week-this"
          />
          <WeekList
            title={`Next week · from ${formatDayShort(nextWeek)}`}
            sessions={rest.filter((s) => s.date >= nextWeek)}
            today={today}
            testId="week-next"
          />
        </div>
        <aside className="min-w-0 space-y-5">
          {settings.checkInsEnabled ? <CheckInTrend checkIns={checkIns} /> : null}
          <FeedCard athleteId={athleteId} initial={feed} />
        </aside>
      </div>
    </>
  );
}
