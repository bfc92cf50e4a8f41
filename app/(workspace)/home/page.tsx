import Link from "next/link";
import { redirect } from "next/navigation";
import { CoachToday } from "@/components/coach/coach-today";
import { PhysioToday } from "@/components/status/physio-today";
import { PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { getCoachToday } from "@/lib/data/coach-today";
import { getPhysioToday } from "@/lib/data/physio-today";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { viewerClock } from "@/lib/dates/zoned";

export const metadata = { title: "Today" };

function Header({
  name,
  today,
  teamName,
  link,
}: {
  name: string;
  today: string;
  teamName: string;
  link: [string, string];
}) {
  return (
    <PageHeader
      title={`Hello, ${name.split(" ")[0]}`}
      lead={`${formatDayLabel(today)} · ${teamName}`}
      actions={
        <Link href={link[0]} className="text-sm font-medium text-lane-700 underline">
          {link[1]}
        </Link>
      }
    />
  );
}

/** Each role lands on its day: the planners (plan:edit) theirs, the medical staff theirs, an athlete their training. */
export default async function HomePage() {
  const viewer = await pageViewer("team:view", "own");
  const clock = viewerClock(viewer);
  if (can(viewer.role, "plan:edit", "team")) {
    const today = await getCoachToday({ teamId: viewer.teamId, userId: viewer.userId, clock });
    return (
      <>
        <Header
          name={viewer.name}
          teamName={viewer.teamName}
          today={today.today}
          link={["/plan-vs-actual", "Plan versus actual"]}
        />
        <CoachToday data={today} />
      </>
    );
  }
  if (can(viewer.role, "availability:edit", "team")) {
    const today = await getPhysioToday({ teamId: viewer.teamId, userId: viewer.userId, clock });
    return (
      <>
        <Header
          name={viewer.name}
          teamName={viewer.teamName}
          today={today.day.today}
          link={["/status", "Squad status"]}
        />
        <PhysioToday data={today} />
      </>
    );
  }
  redirect("/me");
}
