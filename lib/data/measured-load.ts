import "server-only";
import { Op } from "sequelize";
import { planAgainstMeasured, type PlanMeasured } from "@/lib/speed/plan-measured";
import type { SpeedTraceAnalysis } from "@/lib/speed/speed-trace";
import { db } from "@/models";
import { loadSessions } from "./plan-rows";
import { listProfileEntries } from "./speed-profiles";
import { getTeamLoadSettings } from "./team-settings";

/**
 * Planned against measured for the speed traces attached to the team's sessions (lib/speed/README.md §8): one
 * athlete's or the whole team's, traces dated `from`..`to` when given, oldest first. The one reader behind every
 * screen that shows a session's measured running load.
 */
export async function listPlanMeasured({
  teamId,
  athleteId,
  from,
  to,
}: {
  teamId: number;
  athleteId?: number;
  from?: string;
  to?: string;
}): Promise<PlanMeasured[]> {
  const { Athlete, SpeedTest } = await db();
  const traces = await SpeedTest.findAll({
    where: {
      teamId,
      kind: "trace",
      plannedSessionId: { [Op.ne]: null },
      ...(athleteId ? { athleteId } : {}),
      ...(from || to ? { testDate: { [Op.between]: [from ?? "0001-01-01", to ?? "9999-12-31"] } } : {}),
    },
    attributes: ["id", "athleteId", "plannedSessionId", "result"],
    order: [
      ["testDate", "ASC"],
      ["id", "ASC"],
    ],
    raw: true,
  });
  if (traces.length === 0) return [];
  const athleteIds = [...new Set(traces.map((t) => t.athleteId))];
  const [sessions, athletes, settings, entries] = await Promise.all([
    loadSessions({ teamId, id: { [Op.in]: traces.map((t) => t.plannedSessionId!) } }),
    Athlete.findAll({
      where: { teamId, id: athleteIds },
      attributes: ["id", "vmaxMs", "tauS", "stepLengthM", "plyoLevel"],
      raw: true,
    }),
    getTeamLoadSettings({ teamId }),
    Promise.all(athleteIds.map((id) => listProfileEntries({ teamId, athleteId: id }))),
  ]);
  const sessionById = new Map(sessions.map((s) => [s.dto.id, s.dto]));
  const athleteById = new Map(athletes.map((a) => [a.id, a]));
  const entriesOf = new Map(athleteIds.map((id, i) => [id, entries[i]]));
  return traces.flatMap((t) => {
    const session = sessionById.get(t.plannedSessionId!);
    const athlete = athleteById.get(t.athleteId);
    if (!session || !athlete || session.athleteId !== t.athleteId) return [];
    const result = JSON.parse(String(t.result)) as SpeedTraceAnalysis;
    return [
      planAgainstMeasured({
        session,
        trace: { id: t.id, result },
        athlete,
        entries: entriesOf.get(t.athleteId) ?? [],
        settings,
      }),
    ];
  });
}
