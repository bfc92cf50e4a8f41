import "server-only";
import type { Transaction } from "sequelize";
import { teamWeek } from "@/lib/data/plan";
import { loadById, loadSessionsBetween, type Loaded } from "@/lib/data/plan-rows";
import { destroySessions, insertSession, updateSessionRow } from "@/lib/data/plan-sessions";
import { inTeamTransaction } from "@/lib/data/transaction";
import type { Override } from "@/lib/plan/changes";
import type { PlanWriteResult } from "@/lib/plan/types";
import { addDays } from "@/lib/dates/plain-date";
import { bumped, change, notify } from "./plan-changes";

// The week tools: one transaction over the team week, ending in notify() like every plan write.

type WeekTool = { teamId: number; actorUserId: number; date: string; override?: Override; confirmed?: boolean };

async function weekTx<T>(
  { teamId, date }: WeekTool,
  fn: (t: Transaction, weekStart: string, inWeek: Loaded[]) => Promise<T>,
): Promise<T> {
  const { weekStart, weekEnd } = await teamWeek({ teamId, date });
  return inTeamTransaction(teamId, async (t) =>
    fn(t, weekStart, await loadSessionsBetween({ teamId, from: weekStart, to: weekEnd, transaction: t })),
  );
}

/** Copies the week's sessions (cancelled ones left out) to the same days of the next week, as drafts. */
export async function copyWeekToNext(tool: WeekTool): Promise<PlanWriteResult> {
  const { teamId, actorUserId } = tool;
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const created: number[] = [];
    for (const { dto: s } of inWeek.filter((l) => l.dto.status !== "cancelled")) {
      const session = {
        athleteId: s.athleteId,
        date: addDays(s.date, 7),
        startTime: s.startTime,
        durationMin: s.durationMin,
        title: s.title,
        plannedRpe: s.plannedRpe,
        notes: s.notes,
        blocks: s.blocks,
      };
      created.push(await insertSession({ teamId, session, transaction }));
    }
    const after = await loadById(created, transaction);
    await notify({
      transaction,
      teamId,
      actorUserId,
      changes: created.map((id) => change("created", null, after.get(id)!)),
      override: tool.override,
      confirmed: tool.confirmed,
    });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: [] };
  });
}

/** Empties the week: drafts go, published sessions become cancelled, logged sessions stay (logs are never lost). */
export async function clearWeek(tool: WeekTool): Promise<PlanWriteResult> {
  const { teamId, actorUserId } = tool;
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const removed: Loaded[] = [];
    const cancelled: Loaded[] = [];
    for (const l of inWeek) {
      if (l.dto.logged || l.dto.status === "cancelled") continue;
      if (l.dto.status === "draft") removed.push(l);
      else cancelled.push(l);
    }
    await destroySessions({ sessionIds: removed.map((l) => l.dto.id), transaction });
    for (const l of cancelled)
      await updateSessionRow({ sessionId: l.dto.id, values: { status: "cancelled", ...bumped(l.dto) }, transaction });
    const after = await loadById(
      cancelled.map((l) => l.dto.id),
      transaction,
    );
    const changes = [
      ...removed.map((l) => change("deleted", l, null)),
      ...cancelled.map((l) => change("deleted", l, after.get(l.dto.id)!)),
    ];
    await notify({ transaction, teamId, actorUserId, changes });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: removed.map((l) => l.dto.id) };
  });
}

/** Sends the week: every draft becomes published (SEQUENCE stays 0: the first invitation athletes get). */
export async function publishWeek(tool: WeekTool): Promise<PlanWriteResult> {
  const { teamId, actorUserId } = tool;
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const drafts = inWeek.filter((l) => l.dto.status === "draft");
    const publishedAt = new Date();
    for (const l of drafts)
      await updateSessionRow({
        sessionId: l.dto.id,
        values: { status: "published", publishedAt, ...bumped(l.dto) },
        transaction,
      });
    const after = await loadById(
      drafts.map((l) => l.dto.id),
      transaction,
    );
    await notify({
      transaction,
      teamId,
      actorUserId,
      changes: drafts.map((l) => change("published", l, after.get(l.dto.id)!)),
    });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: [] };
  });
}
