import Link from "next/link";
import { LoadChart } from "@/components/load/load-chart";
import { AthleteRestrictions } from "@/components/restrictions/athlete-restrictions";
import { SessionThread } from "@/components/sessions/session-thread";
import { AthleteAlerts } from "@/components/status/athlete-alerts";
import { AvailabilityBadge } from "@/components/status/availability-badge";
import { AvailabilityForm } from "@/components/status/availability-form";
import { Badge } from "@/components/ui/badge";
import { Card, PageHeader } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { levelOn } from "@/lib/availability/levels";
import { pageAthlete } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { listAlerts } from "@/lib/data/alerts";
import { nextPlannedDays, recentAthleteLogs } from "@/lib/data/athlete-medical";
import { currentAvailability } from "@/lib/data/availability";
import { getAthleteLoad } from "@/lib/data/load-views";
import { listSessionConflicts } from "@/lib/data/session-conflicts";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import { teamToday } from "@/lib/dates/zoned";
import { METRIC_INFO } from "@/lib/load/types";

export const metadata = { title: "Athlete status" };

const COMPLETION = { yes: "Done", partly: "Partly done", no: "Not done" } as const;

/** The medical view of one athlete: load, logs with notes, the next 7 days, restrictions and alerts side by side. */
export default async function AthleteStatusPage({ params }: { params: Promise<{ athleteId: string }> }) {
  const { athleteId: raw } = await params;
  const viewer = await pageAthlete(Number(raw), "status:view");
  const { teamId } = viewer;
  const athleteId = viewer.athlete.id;
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const [load, availability, logs, days, conflicts, alerts] = await Promise.all([
    getAthleteLoad({ teamId, athleteId, view: "projected", withDrafts: true }),
    currentAvailability({ teamId, athleteIds: [athleteId] }),
    recentAthleteLogs({ teamId, athleteId, today }),
    nextPlannedDays({ teamId, athleteId, today }),
    listSessionConflicts({ teamId, athleteIds: [athleteId], from: today }),
    listAlerts({ teamId, userId: viewer.userId, query: { status: "all", limit: 30, athleteId } }),
  ]);
  const current = availability.get(athleteId) ?? null;
  const level = levelOn(current, today);
  const canReopen = scopeOf(viewer.role, "log:unlock") === "team";
  const conflictsOf = (sessionId: number) => conflicts.filter((c) => c.sessionId === sessionId);
  return (
    <>
      <PageHeader
        title={load.athlete.name}
        lead={
          <span className="inline-flex flex-wrap items-center gap-2">
            <AvailabilityBadge level={level} />
            {current && level !== "full" ? (
              <span>
                since {formatDayLabel(current.startsOn)}
                {current.returnOn ? `, back ${formatDayLabel(current.returnOn)}` : ""} · {current.note}
              </span>
            ) : null}
          </span>
        }
        actions={
          <span className="flex gap-4 text-sm">
            <Link href="/status" className="font-medium text-lane-700 underline">
              Squad status
            </Link>
            <Link href={`/load/${athleteId}`} className="font-medium text-lane-700 underline">
              Load history
            </Link>
          </span>
        }
      />
      <div className="grid gap-6 lg:grid-cols-2">
        <Card className="p-4 sm:p-5">
          <h2 className="mb-3 font-semibold text-ink-950">Load: {METRIC_INFO[load.metric].label} (logged and plan)</h2>
          <LoadChart days={load.days} unit={METRIC_INFO[load.metric].unit} today={load.today} showPlan />
          <LoadCaution className="mt-3" />
        </Card>
        <Card className="p-4 sm:p-5" data-testid="next-days">
          <h2 className="mb-3 font-semibold text-ink-950">Next 7 days</h2>
          {days.length === 0 ? <p className="text-sm text-ink-500">Nothing planned.</p> : null}
          <ul className="divide-y divide-ink-100">
            {/* `#session-` is the log below (mails and the coach's Today link there); today's session is in both lists. */}
            {days.map((s) => (
              <li key={s.sessionId} id={`next-${s.sessionId}`} className="py-2.5 text-sm" data-testid="next-day">
                <p className="flex flex-wrap items-center gap-2">
                  <span className="font-medium text-ink-900">
                    {formatDayLabel(s.date)} {s.startTime} · {s.title}
                  </span>
                  {s.status === "draft" ? <Badge>draft</Badge> : null}
                  {conflictsOf(s.sessionId).length > 0 ? <Badge tone="spike">breaks a restriction</Badge> : null}
                </p>
                <p className="text-ink-600">{s.blocks.join(" · ") || "No blocks"}</p>
                {conflictsOf(s.sessionId).map((c) => (
                  <p key={c.restrictionId} className="text-xs text-flag-spike">
                    {c.rule}: {c.detail}
                  </p>
                ))}
              </li>
            ))}
          </ul>
        </Card>
      </div>
      <Card className="mt-6 p-4 sm:p-5" data-testid="recent-logs">
        <h2 className="mb-3 font-semibold text-ink-950">Recent logs</h2>
        {logs.length === 0 ? <p className="text-sm text-ink-500">No logs in the last three weeks.</p> : null}
        <ul className="divide-y divide-ink-100">
          {logs.map((l) => (
            <li
              key={l.sessionId}
              id={`session-${l.sessionId}`}
              className={l.note || l.pain ? "-mx-2 my-1 rounded-lg bg-flag-climb-soft px-2 py-2.5" : "py-2.5"}
              data-testid="recent-log"
              data-noted={l.note ? "yes" : "no"}
              data-pain={l.pain ? "yes" : "no"}
            >
              <p className="text-sm">
                <span className="font-medium text-ink-900">
                  {formatDayLabel(l.date)} · {l.title}
                </span>{" "}
                <span className="text-ink-600">
                  {COMPLETION[l.completion]}
                  {l.rpe !== null ? ` · RPE ${l.rpe}` : ""}
                  {l.minutes !== null ? ` · ${l.minutes} min` : ""}
                </span>
              </p>
              {l.pain ? (
                <p className="mt-1">
                  <Badge tone={l.pain.severity >= 4 ? "spike" : "climb"}>
                    Pain: {BODY_REGION_LABEL[l.pain.region]} {l.pain.severity}/10
                    {l.pain.stoppedSession ? ", stopped the session" : ""}
                  </Badge>
                </p>
              ) : null}
              {l.note ? <p className="mt-1 text-sm font-medium text-ink-900">&ldquo;{l.note}&rdquo;</p> : null}
              {l.note || l.messages > 0 ? (
                <details className="mt-2">
                  <summary className="cursor-pointer text-sm font-medium text-lane-700">
                    {l.messages > 0 ? `Messages (${l.messages})` : "Answer"}
                  </summary>
                  <SessionThread sessionId={l.sessionId} canReopen={canReopen} className="mt-2" />
                </details>
              ) : null}
            </li>
          ))}
        </ul>
      </Card>
      <div className="mt-6 grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="restrictions-title">
          <h2 id="restrictions-title" className="mb-3 font-semibold text-ink-950">
            Restrictions
          </h2>
          {scopeOf(viewer.role, "availability:edit") === "team" ? (
            <Card className="mb-4 p-4 sm:p-5">
              <AvailabilityForm athleteId={athleteId} today={today} current={level} />
            </Card>
          ) : null}
          <AthleteRestrictions viewer={viewer} athleteId={athleteId} />
        </section>
        <section aria-labelledby="alerts-title">
          <h2 id="alerts-title" className="mb-3 font-semibold text-ink-950">
            Alert history
          </h2>
          <AthleteAlerts initial={alerts} canManage={scopeOf(viewer.role, "alerts:manage") === "team"} />
        </section>
      </div>
    </>
  );
}
