import type { CreationAttributes } from "sequelize";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { mulberry32 } from "@/lib/random";
import type { Db, PlannedSession, SessionBlock, SessionLog } from "@/models";
import { DEMO_TEMPLATES, type TemplateKey } from "./load-templates";

// A large invented squad with seasons of history, for benchmarks and size checks (not the demo): 5–6 sessions a
// week of 2–4 blocks from the demo shelf, about 90 % of past sessions logged, two weeks planned ahead.

const DAYS: TemplateKey[][] = [
  ["blockStarts", "plyoModerate", "strength"],
  ["tempo", "recovery"],
  ["crouchAccel", "plyoLow"],
  ["flying30", "plyoHigh", "strength"],
  ["tempo", "strength"],
  ["speedEndurance", "tempo", "recovery"],
];

export type SeededSquad = { teamId: number; athleteIds: number[]; sessions: number };

export async function seedSquad(
  d: Db,
  {
    name,
    teamId,
    athletes,
    seasons,
    today,
    seed = 7,
  }: { name?: string; teamId?: number; athletes: number; seasons: number; today: string; seed?: number },
): Promise<SeededSquad> {
  const random = mulberry32(seed);
  const byKey = new Map(DEMO_TEMPLATES.map((t) => [t.key, t]));
  // A new team, or more athletes (in a group of their own) for an existing one.
  const team = teamId
    ? { id: teamId }
    : await d.Team.create({ name: name ?? "Invented Squad", timeZone: "Europe/London", weekStartDay: 1 });
  if (!teamId) await d.TeamLoadSettings.create({ teamId: team.id });
  const group = await d.TrainingGroup.create({ teamId: team.id, name: teamId ? "Squad" : "Sprint", sortOrder: 99 });
  const athleteIds: number[] = [];
  for (let i = 0; i < athletes; i++) {
    const a = await d.Athlete.create({
      teamId: team.id,
      userId: null,
      groupId: group.id,
      name: `Runner ${String(i + 1).padStart(3, "0")}`,
      sex: i % 2 === 0 ? "female" : "male",
      birthDate: "2003-05-01",
      bodyMassKg: 60 + (i % 20),
      vmaxMs: 8.8 + random() * 1.8,
      vmaxTestedOn: addDays(today, -30),
      tauS: 0.95 + random() * 0.4,
      stepLengthM: 2 + random() * 0.5,
      plyoLevel: (["beginner", "intermediate", "advanced"] as const)[i % 3],
    });
    athleteIds.push(a.id);
  }
  const firstWeek = addDays(startOfWeek(today, 1), -7 * 52 * seasons);
  const weeks = 52 * seasons + 2;
  let sessionId = ((await d.PlannedSession.max("id")) as number | null) ?? 0;
  let blockId = ((await d.SessionBlock.max("id")) as number | null) ?? 0;
  let count = 0;
  // One athlete per transaction keeps each bulk insert a few thousand rows.
  for (const athleteId of athleteIds) {
    const sessions: CreationAttributes<PlannedSession>[] = [];
    const blocks: CreationAttributes<SessionBlock>[] = [];
    const logs: CreationAttributes<SessionLog>[] = [];
    for (let w = 0; w < weeks; w++) {
      const weekStart = addDays(firstWeek, 7 * w);
      const skip = random() < 0.5 ? 1 + Math.floor(random() * 5) : -1; // 5 or 6 sessions this week
      DAYS.forEach((keys, day) => {
        if (day === skip) return;
        const date = addDays(weekStart, day);
        const id = ++sessionId;
        const scale = 0.8 + random() * 0.3;
        sessions.push({
          id,
          teamId: team.id,
          athleteId,
          date,
          startTime: day === 5 ? "10:00" : "17:30",
          durationMin: Math.round(50 + 40 * scale),
          title: byKey.get(keys[0])!.title,
          plannedRpe: Math.round((4 + 4 * scale) * 2) / 2,
          status: date > addDays(today, 7) ? "draft" : "published",
          notes: null,
          publishedAt: new Date(`${addDays(weekStart, -3)}T12:00:00Z`),
          sequence: 0,
        });
        const ids: number[] = [];
        keys.slice(0, 2 + Math.floor(random() * 2)).forEach((key, position) => {
          const t = byKey.get(key)!;
          const bid = ++blockId;
          ids.push(bid);
          blocks.push({
            id: bid,
            sessionId: id,
            templateId: null,
            position,
            kind: t.kind,
            title: t.title,
            running: t.running,
            drills: t.drills,
            notes: null,
          });
        });
        if (date < today && random() < 0.9) {
          const partly = random() < 0.06;
          logs.push({
            sessionId: id,
            athleteId,
            completion: partly ? "partly" : "yes",
            rpe: Math.round(3 + random() * 6),
            minutes: 45 + Math.floor(random() * 45),
            completedReps: null,
            notes: null,
          });
        }
      });
    }
    await d.sequelize.transaction(async (transaction) => {
      await d.PlannedSession.bulkCreate(sessions, { transaction });
      await d.SessionBlock.bulkCreate(blocks, { transaction });
      await d.SessionLog.bulkCreate(logs, { transaction });
    });
    count += sessions.length;
  }
  // Ids were given here, so PostgreSQL's sequences did not move: the next ordinary insert would reuse one.
  if (d.sequelize.getDialect() === "postgres")
    for (const table of ["planned_sessions", "session_blocks"])
      await d.sequelize.query(
        `SELECT setval(pg_get_serial_sequence('${table}', 'id'), (SELECT coalesce(max(id), 1) FROM ${table}))`,
      );
  return { teamId: team.id, athleteIds, sessions: count };
}
