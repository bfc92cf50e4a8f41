import Link from "next/link";
import { CoachToday } from "@/components/coach/coach-today";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { listSquad } from "@/lib/data/athletes";
import { getCoachToday } from "@/lib/data/coach-today";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { viewerClock } from "@/lib/dates/zoned";
import { navFor } from "@/lib/nav";

export const metadata = { title: "Today" };

const BLURB: Record<string, string> = {
  "/plan": "Drag blocks onto the week and watch the load respond.",
  "/load": "HSR metres, contacts, sRPE and ACWR for every athlete this week.",
  "/plan-vs-actual": "What was prescribed against what the logs say was done.",
  "/alerts": "Spikes and jumps the plan or the logs have raised.",
  "/status": "Availability, restrictions, alerts and log notes for every athlete.",
  "/squad": "Profiles, tested max velocity and training groups.",
  "/me": "Your sessions, your log and your calendar feed.",
  "/members": "Who is in the club and what they may do.",
  "/settings": "The team's HSR speed, ratio bands and weekly limit.",
};

export default async function HomePage() {
  const viewer = await pageViewer("team:view", "own");
  // The planners (plan:edit for the team) get their day; everyone else keeps the links for now.
  if (can(viewer.role, "plan:edit", "team")) {
    const today = await getCoachToday({ teamId: viewer.teamId, userId: viewer.userId, clock: viewerClock(viewer) });
    return (
      <>
        <PageHeader
          title={`Hello, ${viewer.name.split(" ")[0]}`}
          lead={`${formatDayLabel(today.today)} · ${viewer.teamName}`}
          actions={
            <Link href="/plan-vs-actual" className="text-sm font-medium text-lane-700 underline">
              Plan versus actual
            </Link>
          }
        />
        <CoachToday data={today} />
      </>
    );
  }
  const squad = viewer.role === "athlete" ? [] : await listSquad({ teamId: viewer.teamId });
  const links = navFor(viewer.role).filter((l) => l.href !== "/home");
  return (
    <>
      <PageHeader
        title={`Hello, ${viewer.name.split(" ")[0]}`}
        lead={`${ROLE_LABEL[viewer.role]} at ${viewer.teamName}${viewer.role === "athlete" ? "" : ` · ${squad.length} athletes`}`}
      />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {links.map((l) => (
          <Link key={l.href} href={l.href} className="group">
            <Card className="h-full p-5 transition-shadow group-hover:shadow-lift">
              <h2 className="font-semibold text-ink-950">{l.label}</h2>
              <p className="mt-1 text-sm text-ink-500">{BLURB[l.href] ?? ""}</p>
            </Card>
          </Link>
        ))}
      </div>
    </>
  );
}
