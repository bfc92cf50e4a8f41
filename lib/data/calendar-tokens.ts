import "server-only";
import type { Completion } from "@/lib/domain/sessions";
import { Op, type Transaction } from "sequelize";
import type { CalendarSession } from "@/lib/calendar/types";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { appUrl } from "@/lib/env";
import type { BlockInput, SessionStatus } from "@/lib/load/types";
import { feedUrl, webcalUrl } from "@/lib/calendar/feed-url";
import { sealToken, unsealToken } from "@/lib/security/token-seal";
import { db } from "@/models";

export type CalendarFeedStatus = {
  active: boolean;
  /** Null when the link cannot be shown again (sealed with another secret): rotate to get a new one. */
  url: string | null;
  webcalUrl: string | null;
  createdAt: string | null;
  lastUsedAt: string | null;
};

const NONE: CalendarFeedStatus = { active: false, url: null, webcalUrl: null, createdAt: null, lastUsedAt: null };

export async function getCalendarFeedStatus({ athleteId }: { athleteId: number }): Promise<CalendarFeedStatus> {
  const { CalendarToken } = await db();
  const row = await CalendarToken.findOne({
    where: { athleteId, revokedAt: null },
    attributes: ["tokenSealed", "createdAt", "lastUsedAt"],
  });
  if (!row) return NONE;
  const token = row.tokenSealed ? unsealToken(row.tokenSealed) : null;
  const url = token ? feedUrl(appUrl(), token) : null;
  return {
    active: true,
    url,
    webcalUrl: url ? webcalUrl(url) : null,
    createdAt: row.createdAt.toISOString(),
    lastUsedAt: row.lastUsedAt ? row.lastUsedAt.toISOString() : null,
  };
}

/** Replaces the athlete's feed token (the old link stops working at once) and returns the new link. */
export async function rotateCalendarToken({
  athleteId,
  createdBy,
  transaction,
  now = new Date(),
}: {
  athleteId: number;
  createdBy: number | null;
  transaction?: Transaction;
  now?: Date;
}): Promise<CalendarFeedStatus & { token: string }> {
  const { sequelize, CalendarToken, Athlete } = await db();
  const run = async (t: Transaction) => {
    const athlete = await Athlete.findByPk(athleteId, { attributes: ["id", "teamId"], transaction: t });
    if (!athlete) throw new Error(`No athlete ${athleteId}`);
    await CalendarToken.update({ revokedAt: now }, { where: { athleteId, revokedAt: null }, transaction: t });
    const { token, hash } = newToken(32);
    const row = await CalendarToken.create(
      {
        teamId: athlete.teamId,
        athleteId,
        tokenHash: hash,
        tokenSealed: sealToken(token),
        createdBy,
        revokedAt: null,
        lastUsedAt: null,
      },
      { transaction: t },
    );
    const url = feedUrl(appUrl(), token);
    return {
      token,
      active: true,
      url,
      webcalUrl: webcalUrl(url),
      createdAt: row.createdAt.toISOString(),
      lastUsedAt: null,
    };
  };
  return transaction ? run(transaction) : sequelize.transaction(run);
}

/** Revokes the athlete's feed token; the link answers 404 from now on. Returns whether one was active. */
export async function revokeCalendarToken({
  athleteId,
  now = new Date(),
}: {
  athleteId: number;
  now?: Date;
}): Promise<boolean> {
  const { CalendarToken } = await db();
  const [count] = await CalendarToken.update({ revokedAt: now }, { where: { athleteId, revokedAt: null } });
  return count > 0;
}

export type FeedHead = {
  team: { id: number; name: string; timeZone: string };
  athlete: { id: number; name: string };
};

// Feed readers poll often; a write per poll is wasteful, so the "last used" time is kept to the hour.
const LAST_USED_GRANULARITY_MS = 60 * 60_000;

/**
 * Whose feed a token opens (the athlete and the team fields the feed shows), or null for an unknown or revoked
 * token. The token is the credential here, so it is looked up by hash only.
 */
export async function getFeedHead({
  token,
  now = new Date(),
}: {
  token: string;
  now?: Date;
}): Promise<FeedHead | null> {
  const { CalendarToken, Athlete, Team } = await db();
  const row = await CalendarToken.findOne({
    where: { tokenHash: hashToken(token), revokedAt: null },
    attributes: ["id", "athleteId", "teamId", "lastUsedAt"],
  });
  if (!row) return null;
  const [athlete, team] = await Promise.all([
    Athlete.findOne({ where: { id: row.athleteId, teamId: row.teamId }, attributes: ["id", "name"] }),
    Team.findByPk(row.teamId, { attributes: ["id", "name", "timeZone"] }),
  ]);
  if (!athlete || !team) return null;
  if (!row.lastUsedAt || now.getTime() - row.lastUsedAt.getTime() > LAST_USED_GRANULARITY_MS) {
    await CalendarToken.update({ lastUsedAt: now }, { where: { id: row.id } });
  }
  return {
    team: { id: team.id, name: team.name, timeZone: team.timeZone },
    athlete: { id: athlete.id, name: athlete.name },
  };
}

export type AthleteSession = CalendarSession & {
  sessionId: number;
  plannedRpe: number;
  log: {
    completion: Completion;
    rpe: number | null;
    minutes: number | null;
    completedReps: Record<string, number> | null;
    notes: string | null;
  } | null;
};

/**
 * The sessions an athlete sees (published and cancelled, never drafts) with blocks in order and their log:
 * the calendar feed and the athlete's own training screen read the same list. `from`/`to` bound the dates (inclusive).
 */
export async function listAthleteSessions({
  teamId,
  athleteId,
  from,
  to,
}: {
  teamId: number;
  athleteId: number;
  from?: string;
  to?: string;
}): Promise<AthleteSession[]> {
  const { PlannedSession, SessionBlock, SessionLog } = await db();
  const range = from || to ? { date: { ...(from ? { [Op.gte]: from } : {}), ...(to ? { [Op.lte]: to } : {}) } } : {};
  const rows = await PlannedSession.findAll({
    where: { athleteId, teamId, status: { [Op.in]: ["published", "cancelled"] }, ...range },
    attributes: [
      "id",
      "date",
      "startTime",
      "durationMin",
      "title",
      "plannedRpe",
      "status",
      "sequence",
      "updatedAt",
      "notes",
    ],
    include: [
      {
        model: SessionBlock,
        as: "blocks",
        attributes: ["id", "kind", "title", "running", "drills", "notes", "position"],
      },
      { model: SessionLog, as: "log", attributes: ["completion", "rpe", "minutes", "completedReps", "notes"] },
    ],
    order: [
      ["date", "ASC"],
      ["startTime", "ASC"],
      ["id", "ASC"],
      [{ model: SessionBlock, as: "blocks" }, "position", "ASC"],
    ],
  });
  return rows.map((s) => {
    const log = s.log;
    return {
      id: String(s.id),
      sessionId: s.id,
      date: String(s.date).slice(0, 10),
      startTime: s.startTime,
      durationMin: s.durationMin,
      title: s.title,
      plannedRpe: s.plannedRpe,
      status: s.status as SessionStatus,
      sequence: s.sequence,
      updatedAt: s.updatedAt,
      notes: s.notes,
      blocks: (s.blocks ?? []).map((b): BlockInput => ({
        id: String(b.id),
        kind: b.kind,
        title: b.title,
        running: b.running ?? null,
        drills: b.drills ?? null,
        ...(b.notes ? { notes: b.notes } : {}),
      })),
      log: log
        ? {
            completion: log.completion,
            rpe: log.rpe,
            minutes: log.minutes,
            completedReps: log.completedReps,
            notes: log.notes,
          }
        : null,
    };
  });
}
