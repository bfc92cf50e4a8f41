import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { RetestWeeksForm } from "@/components/speed/retest-weeks-form";
import { TypedTimingForm } from "@/components/speed/typed-timing-form";
import { TimingUploadForm } from "@/components/speed/upload-form";
import { pageViewer } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { getSquadSpeed } from "@/lib/data/speed-views";
import { teamToday } from "@/lib/dates/zoned";
import { formatSpeed } from "@/lib/format/athlete";

export const metadata = { title: "Speed lab" };

export default async function SpeedLabPage() {
  const viewer = await pageViewer("speed:view");
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const { rows, retestWeeks, recent } = await getSquadSpeed({ teamId: viewer.teamId, today });
  const canEdit = scopeOf(viewer.role, "speed:edit") === "team";
  const due = rows.filter((r) => r.retest.due);
  const dropped = rows.filter((r) => r.vmaxDropped);
  return (
    <>
      <PageHeader
        title="Speed lab"
        lead="Timing-gate tests turned into each athlete's own speed profile. Each athlete is compared with their own earlier tests."
      />
      <div className="grid gap-4 lg:grid-cols-2">
        {canEdit ? (
          <Card className="p-4">
            <h2 className="mb-3 text-base font-semibold text-ink-900">Add timing tests</h2>
            <TimingUploadForm teamId={viewer.teamId} />
          </Card>
        ) : null}
        {canEdit ? (
          <Card className="p-4">
            <h2 className="mb-3 text-base font-semibold text-ink-900">Type in a timing trial</h2>
            <TypedTimingForm
              teamId={viewer.teamId}
              athletes={rows.map((r) => ({ id: r.athleteId, name: r.name }))}
              today={today}
            />
          </Card>
        ) : null}
        <Card className="p-4" data-testid="retest-due">
          <h2 className="text-base font-semibold text-ink-900">Due a re-test</h2>
          <p className="mb-2 text-xs text-ink-500">No timing test in the last {retestWeeks} weeks.</p>
          {due.length === 0 ? (
            <p className="text-sm text-ink-700">Everyone has a recent test.</p>
          ) : (
            <ul className="space-y-1 text-sm">
              {due.map((r) => (
                <li key={r.athleteId} className="flex flex-wrap justify-between gap-2">
                  <Link href={`/speed/${r.athleteId}`} className="font-medium text-ink-900 underline">
                    {r.name}
                  </Link>
                  <span className="text-ink-500">
                    {r.lastTimingTest
                      ? `last test ${r.lastTimingTest} (${Math.floor(r.retest.daysSince! / 7)} weeks)`
                      : "never tested"}
                  </span>
                </li>
              ))}
            </ul>
          )}
          {canEdit ? <RetestWeeksForm teamId={viewer.teamId} initial={{ retestWeeks }} /> : null}
        </Card>
        <Card className="p-4" data-testid="vmax-dropped">
          <h2 className="text-base font-semibold text-ink-900">vmax lower than the test before</h2>
          <p className="mb-2 text-xs text-ink-500">
            Fitted vmax of the latest timing test against the athlete&apos;s own previous one.
          </p>
          {dropped.length === 0 ? (
            <p className="text-sm text-ink-700">Nobody&apos;s vmax dropped.</p>
          ) : (
            <ul className="space-y-1 text-sm">
              {dropped.map((r) => (
                <li key={r.athleteId} className="flex flex-wrap justify-between gap-2">
                  <Link href={`/speed/${r.athleteId}`} className="font-medium text-ink-900 underline">
                    {r.name}
                  </Link>
                  <Badge tone="climb">{r.vmaxChange!.toFixed(2)} m/s</Badge>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card className="p-4">
          <h2 className="mb-2 text-base font-semibold text-ink-900">Athletes</h2>
          {rows.length === 0 ? <EmptyState title="No athletes yet" /> : null}
          <ul className="divide-y divide-ink-100 text-sm" data-testid="speed-squad">
            {rows.map((r) => (
              <li key={r.athleteId} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link href={`/speed/${r.athleteId}`} className="font-medium text-ink-900 underline">
                  {r.name}
                </Link>
                <span className="text-ink-700 tabular-nums">{formatSpeed(r.vmaxMs)}</span>
                {r.waiting ? (
                  <Badge tone="note">
                    {r.waiting} result{r.waiting > 1 ? "s" : ""} to review
                  </Badge>
                ) : null}
              </li>
            ))}
          </ul>
        </Card>
      </div>
      {recent.length ? (
        <Card className="mt-4 p-4">
          <h2 className="mb-2 text-base font-semibold text-ink-900">Latest tests</h2>
          <ul className="divide-y divide-ink-100 text-sm">
            {recent.map((t) => (
              <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link href={`/speed/${t.athleteId}#test-${t.id}`} className="text-ink-900 underline">
                  {t.name} · {t.testDate}
                </Link>
                <span className="text-ink-700 tabular-nums">
                  {t.fitVmax !== null ? `vmax ${t.fitVmax.toFixed(2)} m/s` : "no fit"}
                </span>
                {t.accepted ? <Badge tone="steady">in use</Badge> : null}
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
    </>
  );
}
