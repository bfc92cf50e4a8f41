import Link from "next/link";
import { notFound } from "next/navigation";
import { Card, PageHeader } from "@/components/ui/card";
import { pageAthlete } from "@/lib/auth/page-access";
import { FeedCard } from "@/components/calendar/feed-card";
import { AthleteRestrictions } from "@/components/restrictions/athlete-restrictions";
import { AthleteForm } from "@/components/squad/athlete-form";
import { AthleteLogs } from "@/components/squad/athlete-logs";
import { scopeOf } from "@/lib/auth/permissions";
import { getAthlete, listGroups } from "@/lib/data/athletes";
import { getCalendarFeedStatus } from "@/lib/data/calendar-tokens";
import { teamToday } from "@/lib/dates/zoned";
import { PLYO_LEVEL_LABEL, formatSpeed } from "@/lib/format/athlete";

export default async function AthleteProfilePage({ params }: { params: Promise<{ athleteId: string }> }) {
  const { athleteId } = await params;
  const viewer = await pageAthlete(Number(athleteId), "athletes:view");
  const athlete = await getAthlete({ teamId: viewer.teamId, athleteId: viewer.athlete.id });
  if (!athlete) notFound();
  const canEdit = scopeOf(viewer.role, "athletes:edit") === "team";
  const groups = canEdit ? await listGroups({ teamId: viewer.teamId }) : [];
  const canManageFeed = scopeOf(viewer.role, "calendar:manage") === "team";
  const feed = canManageFeed ? await getCalendarFeedStatus({ athleteId: athlete.id }) : null;
  const staff = scopeOf(viewer.role, "athletes:view") === "team";
  const facts: [string, string][] = [
    ["Training group", athlete.groupName ?? "None"],
    ["Max velocity", formatSpeed(athlete.vmaxMs)],
    ["Tested on", athlete.vmaxTestedOn ?? "–"],
    ["Acceleration constant τ", athlete.tauS ? `${athlete.tauS.toFixed(2)} s` : "untested"],
    ["Step length at top speed", athlete.stepLengthM ? `${athlete.stepLengthM.toFixed(2)} m` : "untested"],
    ["Body mass", athlete.bodyMassKg ? `${athlete.bodyMassKg.toFixed(1)} kg` : "–"],
    ["Plyometric experience", PLYO_LEVEL_LABEL[athlete.plyoLevel]],
    ["Born", athlete.birthDate ?? "–"],
  ];
  return (
    <>
      <PageHeader
        title={athlete.name}
        lead="Test values drive the athlete's HSR and near-max metres."
        actions={
          <Link href={`/load/${athlete.id}`} className="text-sm font-medium text-lane-700 underline">
            Load history
          </Link>
        }
      />
      <Card className="p-5">
        <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4" data-testid="athlete-facts">
          {facts.map(([k, v]) => (
            <div key={k}>
              <dt className="text-xs text-ink-500">{k}</dt>
              <dd className="mt-0.5 font-medium text-ink-900 tabular-nums">{v}</dd>
            </div>
          ))}
        </dl>
      </Card>
      <div className="mt-6">
        <AthleteRestrictions viewer={viewer} athleteId={athlete.id} />
      </div>
      {staff ? (
        <div className="mt-6">
          <AthleteLogs
            teamId={viewer.teamId}
            athleteId={athlete.id}
            today={teamToday({ timeZone: viewer.timeZone, now: new Date() })}
            timeZone={viewer.timeZone}
            canReopen={scopeOf(viewer.role, "log:unlock") === "team"}
          />
        </div>
      ) : null}
      {feed ? (
        <div className="mt-6">
          <FeedCard athleteId={athlete.id} initial={feed} />
        </div>
      ) : null}
      {canEdit ? (
        <Card className="mt-6 p-5">
          <h2 className="mb-4 font-semibold text-ink-950">Edit profile and test values</h2>
          <AthleteForm
            athleteId={athlete.id}
            groups={groups}
            initial={{
              name: athlete.name,
              groupId: athlete.groupId ?? "",
              sex: athlete.sex ?? "",
              birthDate: athlete.birthDate ?? "",
              bodyMassKg: athlete.bodyMassKg ?? "",
              vmaxMs: athlete.vmaxMs ?? "",
              vmaxTestedOn: athlete.vmaxTestedOn ?? "",
              tauS: athlete.tauS ?? "",
              stepLengthM: athlete.stepLengthM ?? "",
              plyoLevel: athlete.plyoLevel,
            }}
          />
        </Card>
      ) : null}
    </>
  );
}
