import "server-only";
import type { Transaction } from "sequelize";
import { assertAthletes, insertBlocks, loadById, loadSessions, lockSession, type Loaded } from "@/lib/data/plan-rows";
import {
  destroySessions,
  insertSession,
  listGroupAthleteIds,
  replaceBlocks,
  updateSessionRow,
  writeBlock,
} from "@/lib/data/plan-sessions";
import { getTemplate } from "@/lib/data/templates";
import { inTeamTransaction } from "@/lib/data/transaction";
import { AppError } from "@/lib/errors";
import { blockFromTemplate, sessionFieldsFromTemplate, type BlockContent } from "@/lib/plan/blocks";
import type { Override, SessionChange } from "@/lib/plan/changes";
import { groupTargets } from "@/lib/plan/drop";
import type { PlanWriteResult } from "@/lib/plan/types";
import type { AddBlockInput, CreateSessionInput, SessionBlockBody, UpdateSessionInput } from "@/lib/validations/plan";
import { bumped, change, notCancelled, notify, writeResult } from "./plan-changes";

// One session's writes: each owns its transaction and ends in notify() (restriction guard, then notices).

type Actor = { teamId: number; actorUserId: number };

/** Appends blocks to an existing session as one write (version, and SEQUENCE when athletes were sent it). */
async function appendBlocks(
  teamId: number,
  sessionId: number,
  blocks: BlockContent[],
  version: number | undefined,
  transaction: Transaction,
): Promise<Loaded> {
  const loaded = await lockSession({ teamId, sessionId, version, transaction });
  notCancelled(loaded.dto);
  const start = loaded.dto.blocks.reduce((max, b) => Math.max(max, b.position + 1), 0);
  await insertBlocks({ teamId, sessionId, blocks, start, transaction });
  await updateSessionRow({ sessionId, values: bumped(loaded.dto), transaction });
  return loaded;
}

/**
 * New sessions: written out in full, made from a template (for one athlete, or for every athlete of a group
 * in one transaction; a group athlete who already has a session that day gets the block added to it), or
 * copied from another session (always a new draft).
 */
export async function createSessions({
  teamId,
  actorUserId,
  input,
}: Actor & { input: CreateSessionInput }): Promise<PlanWriteResult> {
  return inTeamTransaction(teamId, async (transaction) => {
    const created: number[] = [];
    const appended: Loaded[] = [];
    if (input.from === "blank") {
      await assertAthletes({ teamId, athleteIds: [input.athleteId], transaction });
      const { from, override, confirmed, ...fields } = input;
      void from;
      void override;
      void confirmed;
      created.push(await insertSession({ teamId, session: fields, transaction }));
    } else if (input.from === "copy") {
      const loaded = await lockSession({ teamId, sessionId: input.sessionId, transaction });
      await assertAthletes({ teamId, athleteIds: [input.athleteId], transaction });
      const s = loaded.dto;
      const blocks = s.blocks.map(({ templateId, kind, title, running, drills, notes }) => ({
        templateId,
        kind,
        title,
        running,
        drills,
        notes,
      }));
      const session = {
        athleteId: input.athleteId,
        date: input.date,
        startTime: s.startTime,
        durationMin: s.durationMin,
        title: s.title,
        plannedRpe: s.plannedRpe,
        notes: s.notes,
        blocks,
      };
      created.push(await insertSession({ teamId, session, transaction }));
    } else {
      const template = await getTemplate({ teamId, templateId: input.templateId, transaction });
      const fields = {
        ...sessionFieldsFromTemplate(template),
        notes: null,
        date: input.date,
        blocks: [blockFromTemplate(template)],
      };
      if (input.athleteId !== undefined) {
        await assertAthletes({ teamId, athleteIds: [input.athleteId], transaction });
        created.push(await insertSession({ teamId, session: { ...fields, athleteId: input.athleteId }, transaction }));
      } else {
        const athleteIds = await listGroupAthleteIds({ teamId, groupId: input.groupId!, transaction });
        const onDay = await loadSessions({ teamId, date: input.date }, transaction);
        const targets = groupTargets(athleteIds, (id) => onDay.filter((l) => l.dto.athleteId === id).map((l) => l.dto));
        for (const t of targets) {
          if (t.sessionId === null)
            created.push(await insertSession({ teamId, session: { ...fields, athleteId: t.athleteId }, transaction }));
          else appended.push(await appendBlocks(teamId, t.sessionId, fields.blocks, undefined, transaction));
        }
      }
    }
    const after = await loadById([...created, ...appended.map((l) => l.dto.id)], transaction);
    const changes: SessionChange[] = [
      ...created.map((id) => change("created", null, after.get(id)!)),
      ...appended.map((before) => change("updated", before, after.get(before.dto.id)!)),
    ];
    await notify({ transaction, teamId, actorUserId, changes, override: input.override, confirmed: input.confirmed });
    return writeResult(after.values(), changes);
  });
}

/** Changes a session (moving it = a new athlete or date). `blocks`, when sent, replaces the list. */
export async function updateSession({
  teamId,
  actorUserId,
  sessionId,
  input,
}: Actor & { sessionId: number; input: UpdateSessionInput }): Promise<PlanWriteResult> {
  return inTeamTransaction(teamId, async (transaction) => {
    const loaded = await lockSession({ teamId, sessionId, version: input.version, transaction });
    const before = loaded.dto;
    const { version, blocks, status, override, confirmed, ...fields } = input;
    void version;
    const reinstate = status === "published" && before.status === "cancelled";
    const publish = status === "published" && before.status === "draft";
    if (!reinstate) notCancelled(before);
    const moves =
      (fields.athleteId !== undefined && fields.athleteId !== before.athleteId) ||
      (fields.date !== undefined && fields.date !== before.date);
    if (moves && before.logged)
      throw new AppError("conflict", "The athlete has logged this session, so it stays on its day. Copy it instead.");
    if (fields.athleteId !== undefined) await assertAthletes({ teamId, athleteIds: [fields.athleteId], transaction });
    if (blocks) await replaceBlocks({ teamId, sessionId, blocks: blocks as SessionBlockBody[], transaction });
    const statusFields = publish
      ? { status: "published" as const, publishedAt: new Date() }
      : reinstate
        ? { status: "published" as const }
        : {};
    await updateSessionRow({ sessionId, values: { ...fields, ...statusFields, ...bumped(before) }, transaction });
    const after = (await loadById([sessionId], transaction)).get(sessionId)!;
    const changes = [change(publish ? "published" : "updated", loaded, after)];
    await notify({ transaction, teamId, actorUserId, changes, override, confirmed });
    return writeResult([after], changes);
  });
}

/**
 * Deletes a draft outright. A session athletes were sent (published) is kept as cancelled so calendars get
 * STATUS:CANCELLED; a session with the athlete's log is kept too, so the log is never lost.
 */
export async function deleteSession({
  teamId,
  actorUserId,
  sessionId,
  version,
}: Actor & { sessionId: number; version: number }): Promise<PlanWriteResult> {
  return inTeamTransaction(teamId, async (transaction) => {
    const loaded = await lockSession({ teamId, sessionId, version, transaction });
    if (loaded.dto.status === "cancelled") return writeResult([loaded], []);
    if (loaded.dto.status === "draft" && !loaded.dto.logged) {
      await destroySessions({ sessionIds: [sessionId], transaction });
      const changes = [change("deleted", loaded, null)];
      await notify({ transaction, teamId, actorUserId, changes });
      return writeResult([], changes, [sessionId]);
    }
    await updateSessionRow({ sessionId, values: { status: "cancelled", ...bumped(loaded.dto) }, transaction });
    const after = (await loadById([sessionId], transaction)).get(sessionId)!;
    const changes = [change("deleted", loaded, after)];
    await notify({ transaction, teamId, actorUserId, changes });
    return writeResult([after], changes);
  });
}

/** Appends a block (a template's content, or one written out) to a session. */
export async function addBlock({
  teamId,
  actorUserId,
  sessionId,
  input,
}: Actor & { sessionId: number; input: AddBlockInput }): Promise<PlanWriteResult> {
  return inTeamTransaction(teamId, async (transaction) => {
    const block =
      input.templateId !== undefined
        ? blockFromTemplate(await getTemplate({ teamId, templateId: input.templateId, transaction }))
        : input.block!;
    const before = await appendBlocks(teamId, sessionId, [block], input.version, transaction);
    const after = (await loadById([sessionId], transaction)).get(sessionId)!;
    const changes = [change("updated", before, after)];
    await notify({ transaction, teamId, actorUserId, changes, override: input.override, confirmed: input.confirmed });
    return writeResult([after], changes);
  });
}

/** Rewrites or removes one block of a session (`block` null removes it). */
export async function changeBlock({
  teamId,
  actorUserId,
  sessionId,
  blockId,
  version,
  block,
  override,
  confirmed,
}: Actor & {
  sessionId: number;
  blockId: number;
  version: number;
  block: SessionBlockBody | null;
  override?: Override;
  confirmed?: boolean;
}): Promise<PlanWriteResult> {
  return inTeamTransaction(teamId, async (transaction) => {
    const loaded = await lockSession({ teamId, sessionId, version, transaction });
    notCancelled(loaded.dto);
    const current = loaded.dto.blocks.find((b) => b.id === blockId);
    if (!current) throw new AppError("not_found", "That block was not found in this session");
    await writeBlock({ teamId, sessionId, blockId, block, transaction });
    await updateSessionRow({ sessionId, values: bumped(loaded.dto), transaction });
    const after = (await loadById([sessionId], transaction)).get(sessionId)!;
    const changes = [change("updated", loaded, after)];
    await notify({ transaction, teamId, actorUserId, changes, override, confirmed });
    return writeResult([after], changes);
  });
}
