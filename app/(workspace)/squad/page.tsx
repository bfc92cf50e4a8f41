import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { pageViewer } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { listSquad } from "@/lib/data/athletes";
import { PLYO_LEVEL_LABEL, formatSpeed } from "@/lib/format/athlete";

export const metadata = { title: "Squad" };

export default async function SquadPage() {
  const viewer = await pageViewer("athletes:view");
  const squad = await listSquad({ teamId: viewer.teamId });
  const groups = new Map<string, typeof squad>();
  for (const a of squad) {
    const key = a.groupName ?? "No group";
    groups.set(key, [...(groups.get(key) ?? []), a]);
  }
  return (
    <>
      <PageHeader
        title="Squad"
        lead="Every athlete with the test values the load engine uses: max velocity, acceleration constant τ and step length."
        actions={
          scopeOf(viewer.role, "athletes:edit") === "team" ? (
            <Link href="/squad/new" className={buttonClass({ variant: "secondary", size: "sm" })}>
              Add athlete
            </Link>
          ) : null
        }
      />
      {squad.length === 0 ? (
        <EmptyState title="No athletes yet">Add athletes from the members screen.</EmptyState>
      ) : null}
      <div className="space-y-6" data-testid="squad-list">
        {[...groups.entries()].map(([group, athletes]) => (
          <section key={group}>
            <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">
              {group} <span className="font-normal tracking-normal normal-case">· {athletes.length}</span>
            </h2>
            <Card className="overflow-x-auto">
              <table className="w-full min-w-[40rem] table-fixed text-sm">
                <thead className="border-b border-ink-100 text-left text-xs text-ink-500">
                  <tr>
                    <th className="w-[30%] px-4 py-2 font-medium">Athlete</th>
                    <th className="w-[20%] px-4 py-2 font-medium">Max velocity</th>
                    <th className="px-4 py-2 font-medium">τ</th>
                    <th className="px-4 py-2 font-medium">Step length</th>
                    <th className="px-4 py-2 font-medium">Body mass</th>
                    <th className="px-4 py-2 font-medium">Plyometrics</th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-ink-50">
                  {athletes.map((a) => (
                    <tr key={a.id} data-testid="squad-row">
                      <td className="px-4 py-2.5">
                        <Link href={`/squad/${a.id}`} className="font-medium text-ink-900 hover:underline">
                          {a.name}
                        </Link>
                        {a.hasAccount ? null : <Badge className="ml-2">no login</Badge>}
                      </td>
                      <td className="px-4 py-2.5 tabular-nums">{formatSpeed(a.vmaxMs)}</td>
                      <td className="px-4 py-2.5 tabular-nums">{a.tauS ? `${a.tauS.toFixed(2)} s` : "–"}</td>
                      <td className="px-4 py-2.5 tabular-nums">
                        {a.stepLengthM ? `${a.stepLengthM.toFixed(2)} m` : "–"}
                      </td>
                      <td className="px-4 py-2.5 tabular-nums">
                        {a.bodyMassKg ? `${a.bodyMassKg.toFixed(1)} kg` : "–"}
                      </td>
                      <td className="px-4 py-2.5">{PLYO_LEVEL_LABEL[a.plyoLevel]}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </Card>
          </section>
        ))}
      </div>
    </>
  );
}
