import "server-only";
import { Op } from "sequelize";
import { listSquad } from "@/lib/data/athletes";
import { listPlanMeasured } from "./measured-load";
import { loadSessions } from "./plan-rows";
import { db } from "@/models";
import { retestStatus, vmaxChange, type RetestStatus } from "@/lib/speed/retest";
import type { TimingTrialAnalysis } from "@/lib/speed/timing-trial";
import { listProfileEntries, listProfileReplacements, type ProfileEntryRow } from "./speed-profiles";
import { getSpeedLabSettings } from "./speed-settings";
import { latestTestDates, listSpeedTests, type SpeedTestRow } from "./speed-tests";

// What the speed-lab screens show (lib/speed/README.md §6): each athlete against their own earlier tests first,
// the squad's range only as context.

export type SpeedTestView = SpeedTestRow & { accepted: boolean; fitVmax: number | null };

async function retestWeeksOf(teamId: number): Promise<number> {
  return (await getSpeedLabSettings({ teamId })).retestWeeks;
}

/**
 * The last timing test: the speed lab's latest, or the test date typed on the athlete's profile when that is
 * later (a test timed outside the lab) (lib/speed/README.md §6).
 */
function lastTimingTestOf(labLatest: string | null | undefined, typed: string | null): string | null {
  const dates = [labLatest ?? null, typed].filter((d): d is string => d !== null).sort();
  return dates.at(-1) ?? null;
}

export type RetestDue = {
  athleteId: number;
  athleteName: string;
  lastTestedOn: string | null;
  daysSince: number | null;
};

/**
 * Athletes due a re-test on `today` by the team's interval (`retestStatus`), longest waiting first, never tested
 * first of all: the coach's Today reads this, the speed lab's squad view the same rule through getSquadSpeed.
 */
export async function listRetestsDue({ teamId, today }: { teamId: number; today: string }) {
  const [squad, latest, retestWeeks] = await Promise.all([
    listSquad({ teamId }),
    latestTestDates({ teamId, kind: "timing" }),
    retestWeeksOf(teamId),
  ]);
  const due: RetestDue[] = squad.flatMap((a) => {
    const lastTestedOn = lastTimingTestOf(latest.get(a.id), a.vmaxTestedOn);
    const status = retestStatus({ lastTimingTest: lastTestedOn, today, retestWeeks });
    return status.due ? [{ athleteId: a.id, athleteName: a.name, lastTestedOn, daysSince: status.daysSince }] : [];
  });
  due.sort(
    (x, y) => (y.daysSince ?? Infinity) - (x.daysSince ?? Infinity) || x.athleteName.localeCompare(y.athleteName),
  );
  return { retestWeeks, due };
}

async function acceptedTestIds(teamId: number): Promise<Set<number>> {
  const { SpeedProfileEntry } = await db();
  const rows = await SpeedProfileEntry.findAll({ where: { teamId }, attributes: ["speedTestId"], raw: true });
  return new Set(rows.map((r) => r.speedTestId).filter((x): x is number => x !== null));
}

function withFit(t: SpeedTestRow, accepted: Set<number>): SpeedTestView {
  const fit = t.kind === "timing" ? (t.result as TimingTrialAnalysis).fit : null;
  return { ...t, accepted: accepted.has(t.id), fitVmax: fit ? fit.vmax : null };
}

type SquadSpeedRow = {
  athleteId: number;
  name: string;
  vmaxMs: number | null;
  lastTimingTest: string | null;
  retest: RetestStatus;
  vmaxChange: number | null;
  vmaxDropped: boolean;
  waiting: number;
};

/** Every athlete: current vmax, last timing test, due a re-test, vmax change between their last two fitted tests. */
export async function getSquadSpeed({ teamId, today }: { teamId: number; today: string }) {
  const [squad, tests, accepted, retestWeeks] = await Promise.all([
    listSquad({ teamId }),
    listSpeedTests({ teamId, kind: "timing" }),
    acceptedTestIds(teamId),
    retestWeeksOf(teamId),
  ]);
  const rows: SquadSpeedRow[] = squad.map((a) => {
    const own = tests.filter((t) => t.athleteId === a.id).map((t) => withFit(t, accepted));
    const fitted = own.filter((t) => t.fitVmax !== null).map((t) => t.fitVmax!);
    const change = vmaxChange(fitted);
    const lastTimingTest = lastTimingTestOf(own[0]?.testDate, a.vmaxTestedOn);
    return {
      athleteId: a.id,
      name: a.name,
      vmaxMs: a.vmaxMs,
      lastTimingTest,
      retest: retestStatus({ lastTimingTest, today, retestWeeks }),
      vmaxChange: change.change,
      vmaxDropped: change.dropped,
      waiting: own.filter((t) => !t.accepted && t.fitVmax !== null).length,
    };
  });
  const recent = tests
    .slice(0, 20)
    .map((t) => ({ ...withFit(t, accepted), name: squad.find((a) => a.id === t.athleteId)?.name ?? "" }));
  return { rows, retestWeeks, recent };
}

/** One athlete's profile history and tests, plus the squad's current range of each value (context only). */
export async function getAthleteSpeed({ teamId, athleteId }: { teamId: number; athleteId: number }) {
  const [squad, entries, replaced, tests, accepted] = await Promise.all([
    listSquad({ teamId }),
    listProfileEntries({ teamId, athleteId }),
    listProfileReplacements({ teamId, athleteId }),
    listSpeedTests({ teamId, athleteId }),
    acceptedTestIds(teamId),
  ]);
  const athlete = squad.find((a) => a.id === athleteId) ?? null;
  const measured = athlete ? await listPlanMeasured({ teamId, athleteId }) : [];
  const range = (values: (number | null)[]) => {
    const v = values.filter((x): x is number => x !== null);
    return v.length ? { min: Math.min(...v), max: Math.max(...v), n: v.length } : null;
  };
  return {
    athlete,
    entries: entries as ProfileEntryRow[],
    replaced,
    tests: tests.map((t) => withFit(t, accepted)),
    measured,
    squadRange: {
      vmaxMs: range(squad.map((a) => a.vmaxMs)),
      tauS: range(squad.map((a) => a.tauS)),
      stepLengthM: range(squad.map((a) => a.stepLengthM)),
    },
  };
}

/** The athlete's sessions a speed trace may belong to: not cancelled, dated `from`..`to` (newest first). */
export async function listTraceSessionChoices({
  teamId,
  athleteId,
  from,
  to,
}: {
  teamId: number;
  athleteId: number;
  from: string;
  to: string;
}): Promise<{ id: number; date: string; title: string }[]> {
  const rows = await loadSessions({
    teamId,
    athleteId,
    date: { [Op.between]: [from, to] },
    status: { [Op.ne]: "cancelled" },
  });
  return rows.map((r) => ({ id: r.dto.id, date: r.dto.date, title: r.dto.title })).reverse();
}
