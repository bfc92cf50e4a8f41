import "server-only";
import { Op, col, fn } from "sequelize";
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
  const { PlannedSession } = await db();
  const row = (await PlannedSession.findOne({
    where: { athleteId, teamId, date: { [Op.gte]: from }, status: { [Op.in]: ["published", "cancelled"] } },
    attributes: [
      [fn("COUNT", col("id")), "count"],
      [fn("MAX", col("updated_at")), "latest"],
      [fn("SUM", col("version")), "versions"],
      [fn("SUM", col("id")), "ids"],
    ],
    raw: true,
  })) as unknown as Record<keyof FeedSessionsStamp, unknown> | null;
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
