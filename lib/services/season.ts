import "server-only";
import { addDays, shiftWeek } from "@/lib/dates/plain-date";
import { listSquad } from "@/lib/data/athletes";
import { teamWeek } from "@/lib/data/plan";
import { loadById, loadSessionsBetween } from "@/lib/data/plan-rows";
import { destroySessions, insertSessions } from "@/lib/data/plan-sessions";
import * as seasonRows from "@/lib/data/season";
import { inTransaction } from "@/lib/data/transaction";
import type { PlanWriteResult } from "@/lib/plan/types";
import { planProgression } from "@/lib/season/progression-plan";
import type { MeetInput, PhaseInput, ProgressionInput } from "@/lib/validations/season";
import { change, notify } from "./plan-changes";

// Season workflows: phases and meets are plain rows; generated weeks and copied phases are plan writes, so they
// end in notify() like every other (restriction guard, load ledger, notices) inside one transaction.

type Team = { teamId: number };

export const createPhase = ({ teamId, input }: Team & { input: PhaseInput }) =>
  inTransaction((transaction) => seasonRows.insertPhase({ teamId, input, transaction }));

export const updatePhase = (args: Team & { phaseId: number; version: number; input: PhaseInput }) =>
  inTransaction((transaction) => seasonRows.updatePhaseRow({ ...args, transaction }));

export const createMeet = ({ teamId, input }: Team & { input: MeetInput }) =>
  inTransaction((transaction) => seasonRows.insertMeet({ teamId, input, transaction }));

export const updateMeet = (args: Team & { meetId: number; input: MeetInput }) =>
  inTransaction((transaction) => seasonRows.updateMeetRow({ ...args, transaction }));

export type ProgressionResult = PlanWriteResult & { weeks: { weekStart: string; factor: number }[] };

/**
 * Writes `weeks` draft weeks from the source week by the rule (lib/season/README.md). Drafts already in those
 * weeks for the same athletes are replaced, so generating again updates rather than doubles; published and
 * logged sessions are never touched.
 */
export async function generateProgression({
  teamId,
  actorUserId,
  input,
}: Team & { actorUserId: number; input: ProgressionInput }): Promise<ProgressionResult> {
  const sourceWeekStart = (await teamWeek({ teamId, date: input.sourceWeek })).weekStart;
  const first = await teamWeek({ teamId, date: input.firstWeek });
  const lastDay = shiftWeek(first.weekEnd, input.weeks - 1);
  return inTransaction(async (transaction) => {
    const [source, target] = await Promise.all([
      loadSessionsBetween({ teamId, from: sourceWeekStart, to: addDays(sourceWeekStart, 6), transaction }),
      loadSessionsBetween({ teamId, from: first.weekStart, to: lastDay, transaction }),
    ]);
    const plan = planProgression({
      source: source.map((l) => l.dto),
      target: target.map((l) => l.dto),
      request: { ...input, sourceWeekStart, firstWeekStart: first.weekStart },
    });
    const gone = new Set(plan.replacedIds);
    const replaced = target.filter((l) => gone.has(l.dto.id));
    await destroySessions({ sessionIds: plan.replacedIds, transaction });
    const created = await insertSessions({ teamId, sessions: plan.drafts, transaction });
    const after = await loadById(created, transaction);
    await notify({
      transaction,
      teamId,
      actorUserId,
      changes: [
        ...replaced.map((l) => change("deleted", l, null)),
        ...created.map((id) => change("created", null, after.get(id)!)),
      ],
      override: input.override,
    });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: plan.replacedIds, weeks: plan.weeks };
  });
}

/**
 * Copies a phase `weeksLater` weeks on (52 keeps the weekdays): the phase row, and its sessions (cancelled ones
 * left out) as drafts at the same weekday, so next season starts from this one's plan.
 */
export async function copyPhase({
  teamId,
  actorUserId,
  phaseId,
  weeksLater,
}: Team & { actorUserId: number; phaseId: number; weeksLater: number }) {
  const phase = await seasonRows.getPhase({ teamId, phaseId });
  const inGroup =
    phase.groupId === null
      ? null
      : new Set((await listSquad({ teamId })).filter((a) => a.groupId === phase.groupId).map((a) => a.id));
  const shift = (d: string) => shiftWeek(d, weeksLater);
  return inTransaction(async (transaction) => {
    const copy = await seasonRows.insertPhase({
      teamId,
      input: { ...phase, startsOn: shift(phase.startsOn), endsOn: shift(phase.endsOn) },
      transaction,
    });
    const inPhase = (await loadSessionsBetween({ teamId, from: phase.startsOn, to: phase.endsOn, transaction })).filter(
      (l) => l.dto.status !== "cancelled" && (!inGroup || inGroup.has(l.dto.athleteId)),
    );
    const created = await insertSessions({
      teamId,
      sessions: inPhase.map(({ dto: s }) => {
        const { athleteId, startTime, durationMin, title, plannedRpe, notes, blocks } = s;
        return {
          athleteId,
          date: shiftWeek(s.date, weeksLater),
          startTime,
          durationMin,
          title,
          plannedRpe,
          notes,
          blocks,
        };
      }),
      transaction,
    });
    const after = await loadById(created, transaction);
    await notify({
      transaction,
      teamId,
      actorUserId,
      changes: created.map((id) => change("created", null, after.get(id)!)),
    });
    return { phase: copy, sessionsCopied: created.length };
  });
}
