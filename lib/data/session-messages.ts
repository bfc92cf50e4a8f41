import "server-only";
import { Op, type Transaction } from "sequelize";
import type { SessionStatus } from "@/lib/domain/sessions";
import { db } from "@/models";
import { userNames } from "./users";

export type SessionMessageDto = {
  id: number;
  sessionId: number;
  userId: number | null;
  authorName: string;
  body: string;
  createdAt: string;
};

/** A session's thread, oldest first. */
export async function listSessionMessages({
  sessionId,
  transaction,
}: {
  sessionId: number;
  transaction?: Transaction;
}): Promise<SessionMessageDto[]> {
  const { SessionMessage } = await db();
  const rows = await SessionMessage.findAll({
    where: { sessionId },
    attributes: ["id", "sessionId", "userId", "body", "createdAt"],
    order: [["id", "ASC"]],
    transaction,
  });
  const names = await userNames(
    rows.map((r) => r.userId),
    transaction,
  );
  return rows.map((r) => ({
    id: r.id,
    sessionId: r.sessionId,
    userId: r.userId,
    authorName: r.userId ? (names.get(r.userId) ?? "A former member") : "A former member",
    body: r.body,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** How many messages each session's thread holds (sessions without any are missing). */
export async function countSessionMessages({
  sessionIds,
}: {
  sessionIds: readonly number[];
}): Promise<Map<number, number>> {
  if (sessionIds.length === 0) return new Map();
  const { SessionMessage } = await db();
  // A grouped count answers one { sessionId, count } per group.
  const rows = await SessionMessage.count({
    where: { sessionId: { [Op.in]: [...sessionIds] } },
    group: ["sessionId"],
  });
  return new Map(rows.map((r) => [Number(r.sessionId), Number(r.count)]));
}

export async function insertSessionMessage({
  transaction,
  ...values
}: {
  transaction: Transaction;
  teamId: number;
  sessionId: number;
  userId: number;
  body: string;
}): Promise<number> {
  const { SessionMessage } = await db();
  return (await SessionMessage.create(values, { transaction })).id;
}

/** Everyone who may be written to about a session: its athlete's login and the team's staff, with e-mail. */
export async function listThreadPeople({
  teamId,
  athleteId,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  transaction?: Transaction;
}): Promise<Array<{ userId: number; name: string; email: string; role: string; isAthlete: boolean }>> {
  const { Membership, User, Athlete } = await db();
  const athlete = await Athlete.findOne({ where: { id: athleteId, teamId }, attributes: ["userId"], transaction });
  const memberships = await Membership.findAll({
    where: { teamId },
    attributes: ["userId", "role"],
    include: [
      { model: User, as: "user", attributes: ["id", "name", "email"], where: { passwordHash: { [Op.ne]: null } } },
    ],
    transaction,
  });
  return memberships
    .filter((m) => m.role !== "athlete" || m.userId === athlete?.userId)
    .map((m) => ({
      userId: m.user!.id,
      name: m.user!.name,
      email: m.user!.email,
      role: m.role,
      isAthlete: m.role === "athlete",
    }));
}

export type ThreadTarget = {
  id: number;
  teamId: number;
  athleteId: number;
  athleteName: string;
  date: string;
  title: string;
  status: SessionStatus;
};

/** The session a thread hangs under, or null; the caller authorizes against its athleteId. */
export async function getThreadTarget({ sessionId }: { sessionId: number }): Promise<ThreadTarget | null> {
  const { PlannedSession, Athlete } = await db();
  const row = await PlannedSession.findByPk(sessionId, {
    attributes: ["id", "teamId", "athleteId", "date", "title", "status"],
    include: [{ model: Athlete, as: "athlete", attributes: ["name"] }],
  });
  if (!row) return null;
  return {
    id: row.id,
    teamId: row.teamId,
    athleteId: row.athleteId,
    athleteName: row.athlete?.name ?? "Athlete",
    date: String(row.date).slice(0, 10),
    title: row.title,
    status: row.status,
  };
}
