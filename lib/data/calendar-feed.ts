import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/models";

export type FeedSessionsStamp = { count: string; latest: string; versions: string; ids: string };

/**
 * What tells one state of an athlete's feed sessions from another, in one indexed aggregate over the feed's
 * range (planned_sessions_athlete_date): every write bumps a session's version and updatedAt, a session that
 * leaves (moved to someone else, deleted) changes the count and the sums, one that arrives the latest time.
 */
export async function feedSessionsStamp({
  teamId,
  athleteId,
  from,
}: {
  teamId: number;
  athleteId: number;
  from: string;
}): Promise<FeedSessionsStamp> {
  const { sequelize } = await db();
  // One aggregate row (COUNT always answers one); on PostgreSQL the sums come back as strings, on SQLite as numbers.
  const row = await sequelize.query<Record<keyof FeedSessionsStamp, unknown>>(
    `SELECT COUNT(id) AS count, MAX(updated_at) AS latest, SUM(version) AS versions, SUM(id) AS ids
       FROM planned_sessions
      WHERE athlete_id = :athleteId AND team_id = :teamId AND date >= :from AND status IN ('published', 'cancelled')`,
    { type: QueryTypes.SELECT, plain: true, replacements: { athleteId, teamId, from } },
  );
  const text = (v: unknown) => (v instanceof Date ? v.toISOString() : String(v ?? ""));
  return { count: text(row?.count), latest: text(row?.latest), versions: text(row?.versions), ids: text(row?.ids) };
}

export type FeedRender = { stamp: string; ics: string; renderedAt: Date };

export async function readFeedRender({ athleteId }: { athleteId: number }): Promise<FeedRender | null> {
  const { CalendarFeedRender } = await db();
  const row = await CalendarFeedRender.findByPk(athleteId, { attributes: ["stamp", "ics", "renderedAt"] });
  return row ? { stamp: row.stamp, ics: row.ics, renderedAt: row.renderedAt } : null;
}

/** Keeps the latest render of the athlete's feed (one row per athlete, replaced in place). */
export async function saveFeedRender({ athleteId, ...render }: FeedRender & { athleteId: number }): Promise<void> {
  const { CalendarFeedRender } = await db();
  await CalendarFeedRender.upsert({ athleteId, ...render });
}
