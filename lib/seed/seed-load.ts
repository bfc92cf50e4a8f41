import { mulberry32 } from "@/lib/random";
import { teamToday } from "@/lib/dates/zoned";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { PlyoDrill, RunningPrescription } from "@/lib/load/types";
import type { CreationAttributes } from "sequelize";
import type { Db, PlannedSession, SessionBlock, SessionLog } from "@/models";
import { DEMO_ATHLETES, DEMO_TEAM } from "./demo-club";
import { DEMO_TEMPLATES, type TemplateKey } from "./load-templates";
import type { SeededClub } from "./seed-club";

/** Weeks of invented, logged history before the current week. */
export const HISTORY_WEEKS = 10;
/** The athlete whose next week is planned far above their recent load (the demo's spike). */
export const SPIKE_ATHLETE = "Jonah Pell";

type Day = { day: number; title: string; startTime: string; blocks: TemplateKey[]; rpe: number; durationMin: number };

// A microcycle per group (day 0 = the team's week start, Monday). High-intensity days sit at least 48 h apart.
const WEEKS: Record<string, Day[]> = {
  "Senior sprint": [
    {
      day: 0,
      title: "Acceleration and plyos",
      startTime: "17:30",
      blocks: ["blockStarts", "plyoModerate"],
      rpe: 7,
      durationMin: 80,
    },
    { day: 1, title: "Tempo", startTime: "17:30", blocks: ["tempo"], rpe: 4, durationMin: 50 },
    { day: 2, title: "Strength", startTime: "17:30", blocks: ["strength"], rpe: 6, durationMin: 60 },
    { day: 3, title: "Max velocity", startTime: "17:30", blocks: ["flying30", "plyoLow"], rpe: 8, durationMin: 80 },
    { day: 5, title: "Speed endurance", startTime: "10:00", blocks: ["speedEndurance"], rpe: 8, durationMin: 70 },
  ],
  "Junior sprint": [
    {
      day: 0,
      title: "Acceleration and plyos",
      startTime: "16:30",
      blocks: ["crouchAccel", "plyoLow"],
      rpe: 6,
      durationMin: 65,
    },
    { day: 2, title: "Tempo and strength", startTime: "16:30", blocks: ["tempo", "strength"], rpe: 5, durationMin: 70 },
    { day: 3, title: "Max velocity", startTime: "16:30", blocks: ["flying30"], rpe: 7, durationMin: 60 },
    { day: 5, title: "Speed endurance", startTime: "10:00", blocks: ["speedEndurance"], rpe: 7, durationMin: 55 },
  ],
  "Hurdles & jumps": [
    {
      day: 0,
      title: "Acceleration and bounds",
      startTime: "18:00",
      blocks: ["blockStarts", "plyoHigh"],
      rpe: 7,
      durationMin: 80,
    },
    { day: 1, title: "Tempo", startTime: "18:00", blocks: ["tempo"], rpe: 4, durationMin: 45 },
    {
      day: 3,
      title: "Max velocity and hops",
      startTime: "18:00",
      blocks: ["flying30", "plyoModerate"],
      rpe: 8,
      durationMin: 80,
    },
    { day: 4, title: "Strength", startTime: "18:00", blocks: ["strength"], rpe: 6, durationMin: 60 },
    { day: 5, title: "Recovery", startTime: "10:00", blocks: ["recovery"], rpe: 2, durationMin: 30 },
  ],
};

// Volume by week, oldest first: build, deload, build, then steady into the current (index HISTORY_WEEKS) and next week.
const WAVE = [0.8, 0.85, 0.9, 0.75, 0.85, 0.9, 0.95, 0.92, 0.96, 1.0, 1.0, 1.0];

const half = (x: number) => Math.round(x * 2) / 2;
const scaleRun = (r: RunningPrescription | null, s: number): RunningPrescription | null =>
  r ? { ...r, reps: Math.max(1, Math.round(r.reps * s)) } : null;
const scaleDrills = (d: PlyoDrill[] | null, s: number): PlyoDrill[] | null =>
  d ? d.map((x) => ({ ...x, reps: Math.max(1, Math.round(x.reps * s)) })) : null;

type Plan = Day & { date: string; scale: number };

/** Jonah's next week: an extra max-velocity day close to Thursday and everything heavier. */
function spikeWeek(days: Day[]): Day[] {
  return [
    ...days.map((d) => ({ ...d, rpe: Math.min(10, d.rpe + 1.5), durationMin: Math.round(d.durationMin * 1.5) })),
    {
      day: 4,
      title: "Extra flying 30s",
      startTime: "17:30",
      blocks: ["flying30", "plyoHigh"],
      rpe: 9,
      durationMin: 90,
    },
    {
      day: 6,
      title: "Extra speed endurance",
      startTime: "10:00",
      blocks: ["speedEndurance", "tempo"],
      rpe: 9,
      durationMin: 90,
    },
  ];
}

/**
 * The demo's load content: a shelf of block templates, HISTORY_WEEKS weeks of published, mostly logged sessions
 * (a few partly done, skipped or never logged), the current week published and next week's plan (seniors
 * published, the rest drafts), with SPIKE_ATHLETE's next week heading for an ACWR spike. Deterministic.
 */
export async function seedLoad(
  d: Db,
  club: SeededClub,
  options: { today?: string } = {},
): Promise<{ templateIds: Record<TemplateKey, number>; sessions: number }> {
  const today = options.today ?? teamToday({ timeZone: DEMO_TEAM.timeZone, now: new Date() });
  const currentWeek = startOfWeek(today, DEMO_TEAM.weekStartDay);
  const firstWeek = addDays(currentWeek, -7 * HISTORY_WEEKS);
  const random = mulberry32(20261201);
  const { sequelize, BlockTemplate } = d;
  return sequelize.transaction(async (transaction) => {
    await BlockTemplate.bulkCreate(
      DEMO_TEMPLATES.map((t) => ({
        teamId: club.teamId,
        kind: t.kind,
        title: t.title,
        running: t.running,
        drills: t.drills,
        notes: t.notes,
        durationMin: t.durationMin,
        plannedRpe: t.plannedRpe,
      })),
      { transaction },
    );
    const stored = await BlockTemplate.findAll({
      where: { teamId: club.teamId },
      attributes: ["id", "title"],
      transaction,
    });
    const idByTitle = new Map(stored.map((t) => [t.title, t.id]));
    const templateIds = Object.fromEntries(DEMO_TEMPLATES.map((t) => [t.key, idByTitle.get(t.title)!])) as Record<
      TemplateKey,
      number
    >;
    const byKey = new Map(DEMO_TEMPLATES.map((t) => [t.key, t]));

    const sessionRows: CreationAttributes<PlannedSession>[] = [];
    const blockRows: CreationAttributes<SessionBlock>[] = [];
    const logRows: CreationAttributes<SessionLog>[] = [];
    // Explicit ids let sessions, blocks and logs go in three bulk inserts.
    let sessionId = ((await d.PlannedSession.max("id", { transaction })) as number | null) ?? 0;
    let blockId = ((await d.SessionBlock.max("id", { transaction })) as number | null) ?? 0;

    for (const athlete of DEMO_ATHLETES) {
      const athleteId = club.athleteIds[athlete.name];
      const personal = 0.9 + random() * 0.2; // each athlete carries a slightly different volume
      for (let w = 0; w < WAVE.length; w++) {
        const weekStart = addDays(firstWeek, 7 * w);
        const isNext = w === HISTORY_WEEKS + 1;
        const days = isNext && athlete.name === SPIKE_ATHLETE ? spikeWeek(WEEKS[athlete.group]) : WEEKS[athlete.group];
        const plans: Plan[] = days.map((day) => ({
          ...day,
          date: addDays(weekStart, day.day),
          scale: WAVE[w] * personal * (0.95 + random() * 0.1),
        }));
        for (const p of plans) {
          const id = ++sessionId;
          const past = p.date < today;
          const status = isNext && athlete.group !== "Senior sprint" ? "draft" : "published";
          const publishedAt = status === "published" ? new Date(`${addDays(weekStart, -3)}T12:00:00Z`) : null;
          const duration = Math.round(p.durationMin * (0.85 + 0.15 * p.scale));
          sessionRows.push({
            id,
            teamId: club.teamId,
            athleteId,
            date: p.date,
            startTime: p.startTime,
            durationMin: duration,
            title: p.title,
            plannedRpe: half(p.rpe * (0.9 + 0.1 * p.scale)),
            status,
            notes: null,
            publishedAt,
            sequence: 0,
          });
          const ids: number[] = [];
          p.blocks.forEach((key, position) => {
            const t = byKey.get(key)!;
            const bid = ++blockId;
            ids.push(bid);
            blockRows.push({
              id: bid,
              sessionId: id,
              templateId: templateIds[key],
              position,
              kind: t.kind,
              title: t.title,
              running: scaleRun(t.running, p.scale),
              drills: scaleDrills(t.drills, p.scale),
              notes: t.notes,
            });
          });
          if (!past) continue;
          const roll = random();
          if (roll < 0.015) continue; // never logged: shows as missing
          const completion = roll < 0.03 ? "no" : roll < 0.08 ? "partly" : "yes";
          const rpe = completion === "no" ? null : Math.max(1, Math.min(10, half(p.rpe + (random() - 0.5) * 2)));
          const minutes =
            completion === "no" ? null : Math.round(duration * (completion === "partly" ? 0.6 : 0.95 + random() * 0.1));
          // A partial session sometimes records reps for its first block; otherwise completion scales the plan.
          const first = blockRows[blockRows.length - ids.length];
          const firstReps = first.running ? first.running.sets * first.running.reps : 0;
          const completedReps =
            completion === "partly" && firstReps > 1 && random() < 0.5
              ? { [String(ids[0])]: Math.floor(firstReps / 2) }
              : null;
          const notes = completion === "no" ? "Felt tight, skipped." : completion === "partly" ? "Cut short." : null;
          logRows.push({ sessionId: id, athleteId, completion, rpe, minutes, completedReps, notes });
        }
      }
    }
    await d.PlannedSession.bulkCreate(sessionRows, { transaction });
    await d.SessionBlock.bulkCreate(blockRows, { transaction });
    await d.SessionLog.bulkCreate(logRows, { transaction });
    return { templateIds, sessions: sessionRows.length };
  });
}
