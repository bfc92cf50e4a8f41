import { sessionMetrics } from "@/lib/load/session-metrics";
import type { PlyoLevel } from "@/lib/domain/athletes";
import type { TeamLoadSettings } from "@/lib/load/types";
import { toSessionInput } from "@/lib/plan/blocks";
import type { PlanSession } from "@/lib/plan/types";
import { entryInForce, type SpeedProfileValues } from "./profile-values";
import type { SpeedTraceAnalysis } from "./speed-trace";

// A speed trace attached to a planned session is that session's measured running load (lib/speed/README.md §8):
// the plan's figures by the engine (sessionMetrics, with the speed profile in force on the session's date) next to
// what the trace measured by the same bands. Every screen that shows it (the athlete's speed page, the planner's
// session dialog, the athlete's load page) takes it from here; the load series keeps counting plan and log.

type RunningFigures = { hsrM: number; nearMaxM: number; runM: number };

export type PlanMeasured = {
  testId: number;
  athleteId: number;
  sessionId: number;
  date: string;
  title: string;
  planned: RunningFigures;
  measured: RunningFigures;
};

type Entry = Pick<SpeedProfileValues, "vmaxMs" | "tauS" | "stepLengthM"> & { effectiveFrom: string };

export function planAgainstMeasured({
  session,
  trace,
  athlete,
  entries,
  settings,
}: {
  session: PlanSession;
  trace: { id: number; result: SpeedTraceAnalysis };
  /** The athlete's current profile, used when no accepted entry is in force on the session's date. */
  athlete: { vmaxMs: number | null; tauS: number | null; stepLengthM: number | null; plyoLevel: PlyoLevel };
  entries: readonly Entry[];
  settings: TeamLoadSettings;
}): PlanMeasured {
  const inForce = entryInForce(entries, session.date);
  const profile = {
    vmax: inForce?.vmaxMs ?? athlete.vmaxMs,
    tau: inForce?.tauS ?? athlete.tauS,
    stepLengthM: inForce?.stepLengthM ?? athlete.stepLengthM,
    plyoLevel: athlete.plyoLevel,
  };
  const planned = sessionMetrics(toSessionInput(session), profile, settings);
  const r = trace.result;
  return {
    testId: trace.id,
    athleteId: session.athleteId,
    sessionId: session.id,
    date: session.date,
    title: session.title,
    planned: { hsrM: planned.metrics.hsrM, nearMaxM: planned.metrics.nearMaxM, runM: planned.runM },
    measured: { hsrM: r.hsrM, nearMaxM: r.nearMaxM, runM: r.distanceM },
  };
}
