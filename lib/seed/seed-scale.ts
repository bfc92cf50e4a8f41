import { DataTypes, type CreationAttributes, type Model, type ModelStatic, type Transaction } from "sequelize";
import { hashPassword } from "@/lib/data/users";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { PlyoDrill, RunningPrescription } from "@/lib/load/types";
import { mulberry32 } from "@/lib/random";
import { passwordSchema } from "@/lib/validations/password";
import type { Db, PlannedSession, SessionBlock, SessionLog } from "@/models";
import { DEMO_PASSWORD, DEMO_TEAM } from "./demo-club";
import { DEMO_TEMPLATES, type TemplateKey } from "./load-templates";

// Invented clubs of any size with seasons of history, for `npm run bench:scale`. Same shapes as the demo
// (its templates, microcycles of 5–6 sessions with 2–4 blocks, logs on past days), written in bulk.

export type ScaleSpec = {
  clubs: number;
  athletesPerClub: number;
  /** Seasons of logged history before the current week (a season is 52 weeks). */
  seasons: number;
  /** The local date that counts as today (YYYY-MM-DD). */
  today: string;
};

export type ScaleClub = { teamId: number; headCoachEmail: string; athleteIds: number[]; athleteEmail: string };

const WEEKS_AHEAD = 2;
const CHUNK = 2000;

type Day = { day: number; title: string; startTime: string; blocks: TemplateKey[]; rpe: number; durationMin: number };

// Six training days a week; one of the lighter ones drops out on about half the weeks (5–6 sessions).
const MICROCYCLE: Day[] = [
  {
    day: 0,
    title: "Acceleration and plyos",
    startTime: "17:30",
    blocks: ["blockStarts", "plyoModerate", "strength"],
    rpe: 7,
    durationMin: 85,
  },
  { day: 1, title: "Tempo", startTime: "17:30", blocks: ["tempo", "recovery"], rpe: 4, durationMin: 50 },
  { day: 2, title: "Strength and hops", startTime: "17:30", blocks: ["strength", "plyoLow"], rpe: 6, durationMin: 60 },
  {
    day: 3,
    title: "Max velocity",
    startTime: "17:30",
    blocks: ["crouchAccel", "flying30", "plyoLow", "strength"],
    rpe: 8,
    durationMin: 90,
  },
  { day: 4, title: "Tempo and mobility", startTime: "17:00", blocks: ["tempo", "recovery"], rpe: 3, durationMin: 45 },
  {
    day: 5,
    title: "Speed endurance",
    startTime: "10:00",
    blocks: ["speedEndurance", "plyoHigh", "tempo"],
    rpe: 8,
    durationMin: 80,
  },
];
const OPTIONAL_DAYS = [1, 4];

const FIRST = ["Ari", "Bea", "Cas", "Dee", "Eli", "Fen", "Gus", "Hal", "Ivo", "Jo", "Kit", "Lu", "Mo", "Nia", "Oli"];
const LAST = ["Brook", "Cairn", "Dale", "Fell", "Glen", "Holt", "Marsh", "Reed", "Shaw", "Thorn", "Vale", "Wold"];

const half = (x: number) => Math.round(x * 2) / 2;
const scaleRun = (r: RunningPrescription | null, s: number): RunningPrescription | null =>
  r ? { ...r, reps: Math.max(1, Math.round(r.reps * s)) } : null;
const scaleDrills = (d: PlyoDrill[] | null, s: number): PlyoDrill[] | null =>
  d ? d.map((x) => ({ ...x, reps: Math.max(1, Math.round(x.reps * s)) })) : null;

/**
 * Rows straight into the model's table in chunks, without building a model instance per row (most of
 * bulkCreate's time at this size): attribute names become column names, JSON columns become text.
 */
async function insertRows<M extends Model>(
  model: ModelStatic<M>,
  rows: CreationAttributes<M>[],
  transaction: Transaction,
) {
  const attributes = model.getAttributes() as Record<string, { field?: string; type: unknown }>;
  const now = new Date();
  const columns = Object.entries(attributes).map(([name, a]) => ({
    name,
    field: a.field ?? name,
    json: a.type instanceof DataTypes.JSON,
  }));
  const qi = model.sequelize!.getQueryInterface();
  for (let i = 0; i < rows.length; i += CHUNK) {
    const chunk = rows.slice(i, i + CHUNK).map((row) => {
      const values: Record<string, unknown> = {};
      for (const c of columns) {
        const v = (row as Record<string, unknown>)[c.name];
        if (c.name === "createdAt" || c.name === "updatedAt") values[c.field] = v ?? now;
        else if (v !== undefined) values[c.field] = c.json && v !== null ? JSON.stringify(v) : v;
      }
      return values;
    });
    await qi.bulkInsert(model.getTableName() as string, chunk, { transaction });
  }
}

/** Team, staff, groups, athletes and the template shelf of one invented club. */
async function createClub(d: Db, n: number, size: number, passwordHash: string, transaction: Transaction) {
  const slug = `club${String(n).padStart(2, "0")}`;
  const team = await d.Team.create({ ...DEMO_TEAM, name: `Bench Club ${n}` }, { transaction });
  await d.TeamLoadSettings.create({ teamId: team.id }, { transaction });
  const staff = [
    { email: `head@${slug}.bench.test`, name: `Head Coach ${n}`, role: "head_coach" as const },
    { email: `coach@${slug}.bench.test`, name: `Coach ${n}`, role: "coach" as const },
    { email: `physio@${slug}.bench.test`, name: `Physio ${n}`, role: "physio" as const },
  ];
  for (const s of staff) {
    const user = await d.User.create({ name: s.name, email: s.email, passwordHash }, { transaction });
    await d.Membership.create({ teamId: team.id, userId: user.id, role: s.role }, { transaction });
  }
  const groups = await d.TrainingGroup.bulkCreate(
    ["Senior sprint", "Junior sprint", "Hurdles & jumps"].map((name, sortOrder) => ({
      teamId: team.id,
      name,
      sortOrder,
    })),
    { transaction },
  );
  const athleteEmail = `athlete@${slug}.bench.test`;
  const first = await d.User.create({ name: `Athlete ${n}`, email: athleteEmail, passwordHash }, { transaction });
  await d.Membership.create({ teamId: team.id, userId: first.id, role: "athlete" }, { transaction });
  const random = mulberry32(1000 + n);
  const athletes = await d.Athlete.bulkCreate(
    Array.from({ length: size }, (_, i) => ({
      teamId: team.id,
      userId: i === 0 ? first.id : null,
      groupId: groups[i % groups.length].id,
      name: `${FIRST[i % FIRST.length]} ${LAST[Math.floor(i / FIRST.length) % LAST.length]} ${i + 1}`,
      sex: i % 2 === 0 ? ("female" as const) : ("male" as const),
      birthDate: `${1996 + (i % 10)}-0${1 + (i % 9)}-1${i % 10}`,
      bodyMassKg: 58 + Math.round(random() * 25),
      vmaxMs: Math.round((8.6 + random() * 2.3) * 100) / 100,
      vmaxTestedOn: "2026-10-06",
      tauS: Math.round((1.0 + random() * 0.4) * 100) / 100,
      stepLengthM: Math.round((1.95 + random() * 0.5) * 100) / 100,
      plyoLevel: (["beginner", "intermediate", "advanced"] as const)[i % 3],
    })),
    { transaction },
  );
  const templates = await d.BlockTemplate.bulkCreate(
    DEMO_TEMPLATES.map(({ key, ...t }) => (void key, { teamId: team.id, ...t })),
    { transaction },
  );
  const templateIds = Object.fromEntries(DEMO_TEMPLATES.map((t, i) => [t.key, templates[i].id])) as Record<
    TemplateKey,
    number
  >;
  return {
    teamId: team.id,
    headCoachEmail: staff[0].email,
    athleteEmail,
    athleteIds: athletes.map((a) => a.id),
    templateIds,
  };
}

/**
 * Creates `spec.clubs` clubs of `spec.athletesPerClub` athletes with `spec.seasons` seasons of published,
 * mostly logged sessions before the current week, the current week and WEEKS_AHEAD weeks ahead (the last one
 * drafts). Deterministic for one spec; sessions, blocks and logs go in as bulk inserts in one transaction.
 */
export async function seedScale(d: Db, spec: ScaleSpec): Promise<ScaleClub[]> {
  const passwordHash = await hashPassword(passwordSchema.parse(DEMO_PASSWORD));
  const byKey = new Map(DEMO_TEMPLATES.map((t) => [t.key, t]));
  const currentWeek = startOfWeek(spec.today, 1);
  const historyWeeks = spec.seasons * 52;
  const firstWeek = addDays(currentWeek, -7 * historyWeeks);
  const clubs: ScaleClub[] = [];
  await d.sequelize.transaction(async (transaction) => {
    let sessionId = ((await d.PlannedSession.max("id", { transaction })) as number | null) ?? 0;
    let blockId = ((await d.SessionBlock.max("id", { transaction })) as number | null) ?? 0;
    for (let n = 1; n <= spec.clubs; n++) {
      const club = await createClub(d, n, spec.athletesPerClub, passwordHash, transaction);
      clubs.push({
        teamId: club.teamId,
        headCoachEmail: club.headCoachEmail,
        athleteEmail: club.athleteEmail,
        athleteIds: club.athleteIds,
      });
      const random = mulberry32(20261202 + n);
      const sessions: CreationAttributes<PlannedSession>[] = [];
      const blocks: CreationAttributes<SessionBlock>[] = [];
      const logs: CreationAttributes<SessionLog>[] = [];
      for (const athleteId of club.athleteIds) {
        const personal = 0.85 + random() * 0.3;
        for (let w = 0; w <= historyWeeks + WEEKS_AHEAD; w++) {
          const weekStart = addDays(firstWeek, 7 * w);
          // Volume waves over a season: build for three weeks, ease off in the fourth.
          const wave = (w % 4 === 3 ? 0.75 : 0.85 + 0.05 * (w % 4)) * (0.9 + 0.1 * Math.sin((w / 52) * 2 * Math.PI));
          const skip = random() < 0.5 ? OPTIONAL_DAYS[Math.floor(random() * OPTIONAL_DAYS.length)] : -1;
          for (const day of MICROCYCLE) {
            if (day.day === skip) continue;
            const id = ++sessionId;
            const date = addDays(weekStart, day.day);
            const scale = wave * personal * (0.95 + random() * 0.1);
            const status = w === historyWeeks + WEEKS_AHEAD ? "draft" : "published";
            const durationMin = Math.round(day.durationMin * (0.85 + 0.15 * scale));
            sessions.push({
              id,
              teamId: club.teamId,
              athleteId,
              date,
              startTime: day.startTime,
              durationMin,
              title: day.title,
              plannedRpe: half(day.rpe * (0.9 + 0.1 * scale)),
              status,
              notes: null,
              publishedAt: status === "published" ? new Date(`${addDays(weekStart, -3)}T12:00:00Z`) : null,
              sequence: 0,
            });
            day.blocks.forEach((key, position) => {
              const t = byKey.get(key)!;
              blocks.push({
                id: ++blockId,
                sessionId: id,
                templateId: club.templateIds[key],
                position,
                kind: t.kind,
                title: t.title,
                running: scaleRun(t.running, scale),
                drills: scaleDrills(t.drills, scale),
                notes: t.notes,
              });
            });
            if (date >= spec.today) continue;
            const roll = random();
            if (roll < 0.02) continue; // never logged
            const completion = roll < 0.04 ? "no" : roll < 0.09 ? "partly" : "yes";
            const rpe = completion === "no" ? null : Math.max(1, Math.min(10, half(day.rpe + (random() - 0.5) * 2)));
            const minutes = completion === "no" ? null : Math.round(durationMin * (completion === "partly" ? 0.6 : 1));
            logs.push({ sessionId: id, athleteId, completion, rpe, minutes, completedReps: null, notes: null });
          }
        }
      }
      await insertRows(d.PlannedSession, sessions, transaction);
      await insertRows(d.SessionBlock, blocks, transaction);
      await insertRows(d.SessionLog, logs, transaction);
    }
  });
  return clubs;
}
