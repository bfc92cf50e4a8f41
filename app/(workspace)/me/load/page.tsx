import Link from "next/link";
import { CheckInTrend } from "@/components/athlete/check-in-trend";
import { getMyLoad, MY_LOAD_WEEKS } from "@/components/athlete/my-load";
import { MyLoadCards } from "@/components/athlete/my-load-cards";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { listCheckIns } from "@/lib/data/check-ins";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { formatDayShort } from "@/lib/format/dates";
import { formatNumber } from "@/lib/format/number";

export const metadata = { title: "My load" };
export const dynamic = "force-dynamic";

/** The athlete's own weekly figures on the phone: only their own, never another athlete's. */
export default async function MyLoadPage() {
  const viewer = await pageViewer("load:view", "own");
  if (!viewer.athleteId) {
    return (
      <>
        <PageHeader title="My load" />
        <EmptyState title="This screen is for athletes">
          Your account has no athlete profile in {viewer.teamName}. The squad&apos;s load is on the load screen.
        </EmptyState>
      </>
    );
  }
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const [load, checkIns] = await Promise.all([
    getMyLoad({
      teamId: viewer.teamId,
      athleteId: viewer.athleteId,
      today,
      timeZone: viewer.timeZone,
      weekStartDay: viewer.weekStartDay,
    }),
    listCheckIns({ athleteId: viewer.athleteId, from: addDays(today, -27), to: today }),
  ]);
  return (
    <>
      <PageHeader
        title="My load"
        lead={`What you logged, week by week, over the last ${MY_LOAD_WEEKS} weeks. The dark bar is this week so far.`}
      />
      <div className="grid gap-5 lg:grid-cols-2">
        <MyLoadCards load={load} />
        <div className="min-w-0 space-y-5">
          <Card className="p-4" data-testid="my-speed">
            <h2 className="font-semibold text-ink-950">Your speed test</h2>
            {load.speed ? (
              <p className="mt-1 text-sm text-ink-700">
                Top speed {formatNumber(load.speed.vmaxMs, 2)} m/s
                {load.speed.testedOn ? `, tested ${formatDayShort(load.speed.testedOn)}` : ""}.
              </p>
            ) : (
              <p className="mt-1 text-sm text-ink-700">No speed test on record yet.</p>
            )}
          </Card>
          <CheckInTrend checkIns={checkIns} />
          <Link href={`/load/${viewer.athleteId}`} className="block text-sm font-medium text-lane-700 underline">
            Day-by-day chart and ratios
          </Link>
        </div>
      </div>
    </>
  );
}
