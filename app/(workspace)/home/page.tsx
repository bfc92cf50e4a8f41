import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { listSquad } from "@/lib/data/athletes";
import { navFor } from "@/lib/nav";

export const metadata = { title: "Today" };

const BLURB: Record<string, string> = {
  "/plan": "Drag blocks onto the week and watch the load respond.",
  "/load": "HSR metres, contacts, sRPE and ACWR for every athlete this week.",
  "/alerts": "Spikes and jumps the plan or the logs have raised.",
  "/squad": "Profiles, tested max velocity and training groups.",
  "/me": "Your sessions, your log and your calendar feed.",
  "/members": "Who is in the club and what they may do.",
  "/settings": "The team's HSR speed, ratio bands and weekly limit.",
};

export default async function HomePage() {
  const viewer = await pageViewer("team:view", "own");
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
