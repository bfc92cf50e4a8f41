import "server-only";
import { listSquad } from "@/lib/data/athletes";
import { db } from "@/models";
import { DEFAULT_RETEST_WEEKS, retestStatus, vmaxChange, type RetestStatus } from "@/lib/speed/retest";
import type { TimingTrialAnalysis } from "@/lib/speed/timing-trial";
import { listProfileEntries, type ProfileEntryRow } from "./speed-profiles";
import { listSpeedTests, type SpeedTestRow } from "./speed-tests";

// What the speed-lab screens show (lib/speed/README.md §6): each athlete against their own earlier tests first,
// the squad's range only as context.

export type SpeedTestView = SpeedTestRow & { accepted: boolean; fitVmax: number | null };

export async function retestWeeksOf(teamId: number): Promise<number> {
  const { SpeedLabSettings } = await db();
  const row = await SpeedLabSettings.findByPk(teamId, { attributes: ["retestWeeks"], raw: true });
  return row?.retestWeeks ?? DEFAULT_RETEST_WEEKS;
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

export type SquadSpeedRow = {
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
    const lastTimingTest = own[0]?.testDate ?? null;
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
  const [squad, entries, tests, accepted] = await Promise.all([
    listSquad({ teamId }),
    listProfileEntries({ teamId, athleteId }),
    listSpeedTests({ teamId, athleteId }),
    acceptedTestIds(teamId),
  ]);
  const athlete = squad.find((a) => a.id === athleteId) ?? null;
  const range = (values: (number | null)[]) => {
    const v = values.filter((x): x is number => x !== null);
    return v.length ? { min: Math.min(...v), max: Math.max(...v), n: v.length } : null;
  };
  return {
    athlete,
    entries: entries as ProfileEntryRow[],
    tests: tests.map((t) => withFit(t, accepted)),
    squadRange: {
      vmaxMs: range(squad.map((a) => a.vmaxMs)),
      tauS: range(squad.map((a) => a.tauS)),
      stepLengthM: range(squad.map((a) => a.stepLengthM)),
    },
  };
}
