"use client";

import { useCallback, useState } from "react";
import { useSWRConfig } from "swr";
import { applyChange, mergeSaved, type TempIds } from "@/lib/plan/apply";
import { findSession, type PlanChange } from "@/lib/plan/drop";
import { rowLoad } from "@/lib/plan/preview";
import type { PlanSession, PlanTemplate, PlanWeek, PlanWriteResult } from "@/lib/plan/types";
import {
  popUndo,
  pushUndo,
  undoForChange,
  undoForDelete,
  undoForEdit,
  type UndoEntry,
  type UndoOp,
} from "@/lib/plan/undo";
import type { SessionEditValues } from "@/lib/validations/plan";
import type { TemplateInput } from "@/lib/validations/template";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import type { PlausibilityCheck } from "@/lib/plan/plausibility";
import { checksOf, currentOf, hitsOf, planApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { planKeys } from "@/lib/client/keys";
import { describeChange } from "./describe";
import { useLatest } from "./latest";

export type Notice = { tone: "saved" | "info" | "refused"; text: string; at: number };

// Temporary ids of optimistic sessions, unique across the page's life.
let tempSeq = -1;
const tempId: TempIds = () => tempSeq--;

function request(week: PlanWeek, change: PlanChange, o: GoAhead): Promise<PlanWriteResult> {
  const version = (id: number) => findSession(week, id)?.version ?? 0;
  switch (change.kind) {
    case "create":
      return planApi.createSession(week.teamId, {
        from: "template",
        templateId: change.templateId,
        athleteId: change.athleteId,
        date: change.date,
        ...o,
      });
    case "group":
      return planApi.createSession(week.teamId, {
        from: "template",
        templateId: change.templateId,
        groupId: change.groupId,
        date: change.date,
        ...o,
      });
    case "copy":
      return planApi.createSession(week.teamId, {
        from: "copy",
        sessionId: change.sessionId,
        athleteId: change.athleteId,
        date: change.date,
        ...o,
      });
    case "add-block":
      return planApi.addBlock(change.sessionId, {
        version: version(change.sessionId),
        templateId: change.templateId,
        ...o,
      });
    case "move":
      return planApi.updateSession(change.sessionId, {
        version: version(change.sessionId),
        athleteId: change.athleteId,
        date: change.date,
        ...o,
      });
  }
}

type Override = { reason: string };
/** What a write carries after a second look: the reason to go past a restriction, the confirmed numbers. */
type GoAhead = { override?: Override; confirmed?: true };
/** Asks the coach for a reason to go past restrictions the server found; null = keep the plan as it was. */
export type AskOverride = (hits: RestrictionHit[], what: string) => Promise<string | null>;
/** Asks "Are you sure?" with the numbers past a plausibility limit; false = keep the plan as it was. */
export type AskSure = (checks: PlausibilityCheck[], what: string) => Promise<boolean>;

/** Thrown when the coach chose not to override: nothing was saved, and nothing more needs saying. */
class KeptAsItWas extends Error {}
/** Thrown when the coach was not sure of the numbers: nothing was saved. */
class NotSure extends Error {}

/** The saved sessions in place, with the server's week numbers where the answer has them. */
function withServerRows(week: PlanWeek, res: PlanWriteResult, temps: readonly number[]): PlanWeek {
  const server = new Map(
    (res.rows ?? []).filter((r) => r.weekStart === week.weekStart).map((r) => [r.athleteId, r.load]),
  );
  const merged = mergeSaved(
    week,
    res.sessions,
    res.removedIds,
    temps,
    (a, s) => server.get(a.id) ?? rowLoad(week, a, s),
  );
  const stale = (res.touched ?? []).some((t) => week.days.includes(t.date) && !server.has(t.athleteId));
  return stale || !res.rows ? { ...merged, unconfirmed: true } : merged;
}

/** A week whose numbers were only computed in the browser is refetched to confirm them. */
const needsRefetch = (week: PlanWeek | undefined) => Boolean(week?.unconfirmed);

const blockBodies = (s: Pick<PlanSession, "blocks">) =>
  s.blocks.map(({ templateId, kind, title, running, drills, notes }) => ({
    templateId,
    kind,
    title,
    running,
    drills,
    notes,
  }));

/**
 * Every write the planner makes: optimistic in the grid (numbers from lib/load), then confirmed by the server's
 * answer and a refetch. A refusal rolls back with the server's reason; a 409 refetches and says what happened.
 */
export function usePlanActions({
  swrKey,
  current,
  askOverride,
  askSure,
}: {
  swrKey: string;
  current: () => PlanWeek | undefined;
  askOverride: AskOverride;
  askSure: AskSure;
}) {
  const { mutate, cache } = useSWRConfig();
  const [notice, setNoticeState] = useState<Notice | null>(null);
  const [undoStack, setUndoStack] = useState<UndoEntry[]>([]);
  const [saving, setSaving] = useState(0);
  const undoBox = useLatest(undoStack);

  const say = useCallback((tone: Notice["tone"], text: string) => setNoticeState({ tone, text, at: Date.now() }), []);
  const refetch = useCallback(() => mutate(swrKey), [mutate, swrKey]);

  const explain = useCallback(
    async (e: unknown, what: string) => {
      if (e instanceof KeptAsItWas) {
        say("info", `Not planned: ${what}. The restriction stands.`);
      } else if (e instanceof NotSure) {
        say("info", `Not saved: ${what}. Nothing changed; check the numbers.`);
      } else if (e instanceof ApiError && e.stale) {
        await refetch();
        const s = currentOf(e);
        say(
          "refused",
          `${what} was not saved: someone else changed ${s ? `"${s.title}"` : "this session"} a moment ago. ` +
            "The grid now shows the latest plan; try again if it is still needed.",
        );
      } else if (e instanceof ApiError && e.status === 404) {
        await refetch();
        say("refused", `${what} was not saved: it is no longer in the plan. The grid has been refreshed.`);
      } else {
        say("refused", `${what} was not saved: ${e instanceof Error ? e.message : "unknown error"}`);
      }
    },
    [refetch, say],
  );

  const track = useCallback(async <T>(fn: () => Promise<T>): Promise<T> => {
    setSaving((n) => n + 1);
    try {
      return await fn();
    } finally {
      setSaving((n) => n - 1);
    }
  }, []);

  /**
   * Runs a write; when the server asks for a second look (numbers past a plausibility limit, a physio
   * restriction), asks the coach and sends it again with the answer; each question is asked once.
   */
  const withGoAhead = useCallback(
    async <T>(what: string, fn: (goAhead: GoAhead) => Promise<T>, first: GoAhead = {}): Promise<T> => {
      let goAhead = first;
      for (;;) {
        try {
          return await fn(goAhead);
        } catch (e) {
          if (e instanceof ApiError && e.implausible && !goAhead.confirmed) {
            if (!(await askSure(checksOf(e), what))) throw new NotSure();
            goAhead = { ...goAhead, confirmed: true };
          } else if (e instanceof ApiError && e.restricted && !goAhead.override) {
            const reason = await askOverride(hitsOf(e), what);
            if (reason === null) throw new KeptAsItWas();
            goAhead = { ...goAhead, override: { reason } };
          } else throw e;
        }
      }
    },
    [askOverride, askSure],
  );

  /** A drop: shown at once, saved, then confirmed. `override` carries the reason the coach gave before the drop. */
  const saveChange = useCallback(
    async (change: PlanChange, override?: Override) => {
      const before = current();
      if (!before) return;
      // The week the server page seeded is fallback data, not cache, until the first write. Put it in the cache
      // first: a rollback restores what the cache held, and restoring nothing would leave the optimistic card
      // on screen (keepPreviousData keeps showing the last data when the cache is empty).
      if (cache.get(swrKey)?.data === undefined && planKeys.week(before.teamId, before.weekStart) === swrKey)
        await mutate(swrKey, before, { revalidate: false });
      const what = describeChange(before, change);
      let temps: number[] = [];
      try {
        const save = (o: GoAhead) =>
          mutate<PlanWeek, PlanWriteResult>(swrKey, request(before, change, o), {
            optimisticData: (data) => {
              const base = data ?? before;
              const next = applyChange(base, change, tempId, (a, s) => rowLoad(base, a, s));
              const had = new Set(base.athletes.flatMap((a) => a.sessions.map((s) => s.id)));
              temps = next.athletes.flatMap((a) => a.sessions.map((s) => s.id)).filter((id) => id < 0 && !had.has(id));
              return next;
            },
            // SWR hands populateCache the data from before the optimistic step; the answer carries the
            // server's numbers for the touched rows (recomputed locally only if it did not).
            populateCache: (res, data) => withServerRows(data ?? before, res, temps),
            rollbackOnError: true,
            revalidate: (data) => needsRefetch(data),
          });
        const result = await track(() => withGoAhead(what, save, override ? { override } : {}));
        if (!result) return;
        setUndoStack((st) =>
          pushUndo(
            st,
            undoForChange(change, (id) => findSession(before, id) ?? undefined, result),
          ),
        );
        say("saved", `Saved: ${what}.`);
      } catch (e) {
        await explain(e, what);
      }
    },
    [cache, current, explain, mutate, say, swrKey, track, withGoAhead],
  );

  /**
   * Writes the server's answer into the grid and refetches the numbers. The week seeded from the server page
   * is SWR fallback data, not cache, until the first write: then `data` is undefined and the week on screen
   * (the same key) is the one to merge into, or the grid would keep the old card and versions.
   */
  const settle = useCallback(
    (res: PlanWriteResult) =>
      mutate<PlanWeek, PlanWriteResult>(swrKey, Promise.resolve(res), {
        populateCache: (r, data) => {
          const shown = current();
          const base = data ?? (shown && planKeys.week(shown.teamId, shown.weekStart) === swrKey ? shown : undefined);
          return base ? withServerRows(base, r, []) : data!;
        },
        revalidate: (data) => data === undefined || needsRefetch(data),
      }),
    [current, mutate, swrKey],
  );

  const runOp = useCallback(
    async (op: UndoOp, versions: Map<number, number>, week: PlanWeek, o: GoAhead): Promise<PlanWriteResult> => {
      const v = (id: number) => versions.get(id) ?? findSession(week, id)?.version ?? 0;
      switch (op.op) {
        case "remove":
          return planApi.deleteSession(op.sessionId, v(op.sessionId));
        case "move":
          return planApi.updateSession(op.sessionId, {
            version: v(op.sessionId),
            athleteId: op.athleteId,
            date: op.date,
            ...o,
          });
        case "remove-block":
          return planApi.removeBlock(op.sessionId, op.blockId, v(op.sessionId));
        case "reinstate":
          return planApi.updateSession(op.sessionId, { version: v(op.sessionId), status: "published", ...o });
        case "restore-fields": {
          const { blocks, ...fields } = op.fields;
          return planApi.updateSession(op.sessionId, {
            version: v(op.sessionId),
            ...fields,
            blocks: blockBodies({ blocks }),
            ...o,
          });
        }
        case "recreate": {
          const s = op.session;
          return planApi.createSession(week.teamId, {
            from: "blank",
            athleteId: s.athleteId,
            date: s.date,
            startTime: s.startTime,
            durationMin: s.durationMin,
            title: s.title,
            plannedRpe: s.plannedRpe,
            notes: s.notes,
            blocks: blockBodies(s),
            ...o,
          });
        }
      }
    },
    [],
  );

  const undo = useCallback(async () => {
    const { entry, rest } = popUndo(undoBox.get());
    const week = current();
    if (!entry || !week) return;
    setUndoStack(rest);
    const versions = new Map<number, number>();
    try {
      await track(async () => {
        for (const op of entry.ops) {
          const res = await withGoAhead(`the undo of the ${entry.label}`, (o) => runOp(op, versions, week, o));
          for (const s of res.sessions) versions.set(s.id, s.version);
          await settle(res);
        }
      });
      say("saved", `Undone: ${entry.label}.`);
    } catch (e) {
      await explain(e, `Undo of the ${entry.label}`);
    }
  }, [current, explain, runOp, say, settle, track, undoBox, withGoAhead]);

  const saveSession = useCallback(
    async (before: PlanSession, values: SessionEditValues, version: number, first: GoAhead = {}) => {
      const body = { version, ...values, notes: values.notes?.trim() ? values.notes : null };
      const res = await track(() =>
        withGoAhead(
          `the changes to "${values.title}"`,
          (o) => planApi.updateSession(before.id, { ...body, ...o }),
          first,
        ),
      );
      await settle(res);
      setUndoStack((st) => pushUndo(st, undoForEdit(before)));
      say("saved", `Saved "${values.title}".`);
    },
    [say, settle, track, withGoAhead],
  );

  const deleteSession = useCallback(
    async (s: PlanSession, version = s.version) => {
      const res = await track(() => planApi.deleteSession(s.id, version));
      await settle(res);
      setUndoStack((st) => pushUndo(st, undoForDelete(s, res)));
      say(
        "saved",
        res.removedIds.includes(s.id)
          ? `Deleted "${s.title}".`
          : `Cancelled "${s.title}"; athletes will see it cancelled.`,
      );
    },
    [say, settle, track],
  );

  const runTool = useCallback(
    async (tool: "copy-to-next" | "clear" | "publish") => {
      const week = current();
      if (!week) return;
      try {
        const res = await track(() =>
          withGoAhead("this copy of the week", (o) =>
            planApi.weekTool(week.teamId, tool, { week: week.weekStart, ...o }),
          ),
        );
        await refetch();
        if (tool === "clear") setUndoStack([]);
        const n = res.sessions.length;
        const text =
          tool === "publish"
            ? n === 0
              ? "Nothing to publish: the week has no drafts."
              : `Published ${n} session${n === 1 ? "" : "s"}; athletes will get them in their calendars.`
            : tool === "copy-to-next"
              ? `Copied ${n} session${n === 1 ? "" : "s"} to next week as drafts.`
              : `Cleared the week: ${res.removedIds.length} draft${res.removedIds.length === 1 ? "" : "s"} removed, ` +
                `${n} published session${n === 1 ? "" : "s"} cancelled.`;
        say("saved", text);
      } catch (e) {
        await explain(e, "The week tool");
      }
    },
    [current, explain, refetch, say, track, withGoAhead],
  );

  const saveTemplate = useCallback(
    async (values: TemplateInput, template: Pick<PlanTemplate, "id" | "version"> | null) => {
      const week = current();
      if (!week) return;
      try {
        await track(() =>
          template === null
            ? planApi.createTemplate(week.teamId, values)
            : planApi.updateTemplate(template.id, { ...values, version: template.version }),
        );
      } catch (e) {
        // Someone else saved the block first: show their version on the shelf; the editor shows why.
        if (e instanceof ApiError && e.stale) await refetch();
        throw e;
      }
      await refetch();
      say("saved", `Saved the block "${values.title}".`);
    },
    [current, refetch, say, track],
  );

  const deleteTemplate = useCallback(
    async (id: number, title: string) => {
      await track(() => planApi.deleteTemplate(id));
      await refetch();
      say("saved", `Deleted the block "${title}".`);
    },
    [refetch, say, track],
  );

  const clearUndo = useCallback(() => setUndoStack([]), []);

  return {
    notice,
    say,
    saving,
    undoStack,
    undo,
    clearUndo,
    saveChange,
    saveSession,
    deleteSession,
    runTool,
    saveTemplate,
    deleteTemplate,
    refetch,
  };
}
