"use client";

import {
  KeyboardSensor,
  MouseSensor,
  TouchSensor,
  useSensor,
  useSensors,
  type DragEndEvent,
  type DragMoveEvent,
  type DragStartEvent,
} from "@dnd-kit/core";
import { useCallback, useEffect, useMemo, useState } from "react";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import { formatNumber } from "@/lib/format/number";
import { findSession, resolveDrop, type DragSource, type DropTarget, type PlanChange } from "@/lib/plan/drop";
import { previewChange, type RowPreview } from "@/lib/plan/preview";
import { changeHits } from "@/lib/plan/restrictions";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import type { PlanWeek } from "@/lib/plan/types";
import {
  announcements,
  cellAtPoint,
  dragId,
  dropId,
  gridKeyboardCoordinates,
  SCREEN_READER_INSTRUCTIONS,
  type DragData,
  type GridLayout,
} from "./dnd";
import { describeChange, targetLabel } from "./describe";
import { groupKey } from "./group-row";
import { useHoverStore } from "./hover-store";
import { useBox, type Latest } from "./latest";

type Preview = {
  week: PlanWeek;
  key: string;
  outcome: ReturnType<typeof resolveDrop>;
  rows: RowPreview[];
  hits: RestrictionHit[];
};

type Args = {
  week: Latest<PlanWeek | undefined>;
  collapsed: Latest<ReadonlySet<string>>;
  /** On a phone the week of one athlete, days stacked: the keyboard walks that athlete's days up and down. */
  phoneAthlete: Latest<number | null>;
  /** On a phone, one day for the squad: the keyboard walks the athletes up and down. */
  phoneDay: Latest<string | null>;
  /** `hits`: the physio restrictions the change would go past (the caller asks for a reason first). */
  onDrop: (change: PlanChange, hits: RestrictionHit[]) => void;
  onRefused: (reason: string) => void;
};

/**
 * Everything about dragging: sensors (pointer, and keyboard moving cell by cell), the copy modifier, the
 * in-browser load preview of the cell under the item, screen-reader announcements, and the drop itself.
 */
export function usePlannerDnd({ week, collapsed, phoneAthlete, phoneDay, onDrop, onRefused }: Args) {
  const [active, setActive] = useState<DragData | null>(null);
  const hoverStore = useHoverStore();
  const setHover = hoverStore.set;
  const [altDown, setAltDown] = useState(false);
  const [copyArmedId, setCopyArmedId] = useState<number | null>(null);
  const alt = useBox(false);
  const armed = useBox<number | null>(null);
  const dragging = useBox<DragData | null>(null);
  const keyMoves = useBox(0);
  const cache = useBox<Preview | null>(null);
  /** The pointer in viewport coordinates, and whether the drag is a keyboard one (then `aimed` is the cell). */
  const pointer = useBox<{ x: number; y: number } | null>(null);
  const byKeyboard = useBox(false);
  const aimed = useBox<DropTarget | null>(null);
  /** The cell the item points at (kept after the drop, for the announcement), and the last one previewed. */
  const pointed = useBox<DropTarget | null>(null);
  const previewed = useBox<string | null>(null);

  const armCopy = useCallback(
    (sessionId: number | null) => {
      armed.set(sessionId);
      setCopyArmedId(sessionId);
    },
    [armed],
  );

  const copies = useCallback(
    (src: DragSource) => alt.get() || (src.type === "session" && armed.get() === src.sessionId),
    [alt, armed],
  );

  // dnd-kit asks twice per new target (onDragOver and the announcement): compute the preview once.
  const previewFor = useCallback(
    (w: PlanWeek, source: DragSource, target: DropTarget): Preview => {
      const copy = copies(source);
      const key = `${dragId(source)}>${dropId(target)}:${copy}`;
      const last = cache.get();
      if (last?.week === w && last.key === key) return last;
      const outcome = resolveDrop({ week: w, source, target, copy });
      const next = {
        week: w,
        key,
        outcome,
        rows: outcome?.ok ? previewChange(w, outcome.change) : [],
        hits: outcome?.ok ? changeHits(w, outcome.change) : [],
      };
      cache.set(next);
      return next;
    },
    [cache, copies],
  );

  const layout = useCallback((): GridLayout => {
    const w = week.get();
    if (!w) return { rows: [], days: [] };
    const day = phoneDay.get();
    if (day !== null)
      return {
        rows: w.groups.flatMap((g) =>
          g.athleteIds.map((id) => ({
            key: `athlete:${id}`,
            target: (date: string): DropTarget => ({ type: "cell", athleteId: id, date }),
          })),
        ),
        days: [day],
      };
    const one = phoneAthlete.get();
    if (one !== null)
      return {
        rows: [{ key: `athlete:${one}`, target: (date) => ({ type: "cell", athleteId: one, date }) }],
        days: w.days,
        vertical: true,
      };
    const rows: GridLayout["rows"] = [];
    for (const g of w.groups) {
      if (g.id !== null && w.scope === "team")
        rows.push({ key: `group:${g.id}`, target: (date) => ({ type: "group", groupId: g.id!, date }) });
      if (collapsed.get().has(groupKey(g))) continue;
      for (const id of g.athleteIds)
        rows.push({ key: `athlete:${id}`, target: (date) => ({ type: "cell", athleteId: id, date }) });
    }
    return { rows, days: w.days };
  }, [week, collapsed, phoneAthlete, phoneDay]);

  const keyboardStart = useCallback(() => {
    const src = dragging.get()?.source;
    const w = week.get();
    const s = src?.type === "session" && w ? findSession(w, src.sessionId) : null;
    const origin: DropTarget | null = s ? { type: "cell", athleteId: s.athleteId, date: s.date } : null;
    const moves = keyMoves.get();
    keyMoves.set(moves + 1);
    return { origin, moves };
  }, [dragging, keyMoves, week]);

  const coordinateGetter = useMemo(
    () => gridKeyboardCoordinates(layout, keyboardStart, aimed),
    [layout, keyboardStart, aimed],
  );
  // A mouse drags after 5 px; a finger after holding still for 250 ms (moving 8 px sooner scrolls the page
  // instead), the long-press convention of touch screens, so a swipe over the cards still scrolls.
  const sensors = useSensors(
    useSensor(MouseSensor, { activationConstraint: { distance: 5 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 250, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter }),
  );

  const describeOver = useCallback(
    (source: DragSource, target: DropTarget): string => {
      const w = week.get();
      if (!w) return "";
      const { outcome, rows, hits } = previewFor(w, source, target);
      const where = targetLabel(w, target);
      if (!outcome) return `Over ${where}, where it already is.`;
      if (!outcome.ok) return `Over ${where}. Cannot drop here: ${outcome.reason}`;
      const parts = rows.map((r) => {
        const name = w.athletes.find((a) => a.id === r.athleteId)?.name ?? "";
        const warn = r.warnings.map((f) => `${FLAG_DISPLAY[f.kind].label}: ${f.reason}`).join(" ");
        const srpe = `${formatNumber(r.before.week.totals.srpe, 0)} to ${formatNumber(r.after.week.totals.srpe, 0)}`;
        return `${name}: sRPE ${srpe} AU.${warn ? ` ${warn}` : ""}`;
      });
      const limits = hits.map((h) => `Physio restriction: ${h.rule}. ${h.detail}.`).join(" ");
      const asks = limits ? ` ${limits} Dropping asks for a reason.` : "";
      return `Over ${where}. Dropping makes ${describeChange(w, outcome.change)}. ${parts.join(" ")}${asks}`;
    },
    [previewFor, week],
  );
  const pointedAt = useCallback(() => {
    const target = pointed.get();
    const w = week.get();
    return { target, label: target && w ? targetLabel(w, target) : null };
  }, [pointed, week]);
  const accessibility = useMemo(
    () => ({
      announcements: announcements(describeOver, pointedAt),
      screenReaderInstructions: { draggable: SCREEN_READER_INSTRUCTIONS },
    }),
    [describeOver, pointedAt],
  );

  const onDragStart = useCallback(
    (e: DragStartEvent) => {
      const data = (e.active.data.current as DragData | undefined) ?? null;
      dragging.set(data);
      keyMoves.set(0);
      byKeyboard.set(e.activatorEvent instanceof KeyboardEvent);
      aimed.set(null);
      pointed.set(null);
      previewed.set(null);
      setActive(data);
    },
    [aimed, byKeyboard, dragging, keyMoves, pointed, previewed],
  );

  /** The cell under the item now: the one the arrow keys aimed at, or the one under the pointer. */
  const cellNow = useCallback((): DropTarget | null => {
    if (byKeyboard.get()) return aimed.get();
    const p = pointer.get();
    return p ? cellAtPoint(p.x, p.y) : null;
  }, [aimed, byKeyboard, pointer]);

  /** Previews the cell under the item now; only a new cell, or a flip of the copy key, previews again. */
  const previewNow = useCallback(
    (data: DragData | undefined) => {
      const w = week.get();
      const target = cellNow();
      pointed.set(target);
      const key = target && data ? `${dropId(target)}:${copies(data.source)}` : null;
      if (key === previewed.get()) return;
      previewed.set(key);
      if (!w || !data || !target) {
        setHover(null);
        return;
      }
      const { outcome, rows, hits } = previewFor(w, data.source, target);
      setHover({
        source: data.source,
        target,
        rows: new Map(rows.map((r) => [r.athleteId, r])),
        refusal: outcome && !outcome.ok ? outcome.reason : null,
        text: outcome?.ok ? describeChange(w, outcome.change) : "",
        hits,
      });
    },
    [cellNow, copies, pointed, previewFor, previewed, setHover, week],
  );

  // Called on every move.
  const onDragMove = useCallback(
    (e: DragMoveEvent) => previewNow(e.active.data.current as DragData | undefined),
    [previewNow],
  );

  // Alt held while dropping copies instead of moving; Escape leaves the card menu's copy mode.
  useEffect(() => {
    const on = (e: KeyboardEvent | PointerEvent) => {
      if (e.altKey !== alt.get()) {
        alt.set(e.altKey);
        setAltDown(e.altKey);
        // A keyboard drag or a still pointer sends no move: preview the same cell as a copy (or a move) now.
        const d = dragging.get();
        if (d) previewNow(d);
      }
      if (e instanceof KeyboardEvent && e.key === "Escape" && !dragging.get()) {
        armed.set(null);
        setCopyArmedId(null);
      }
    };
    // Capture phase: the position is known before dnd-kit's own listener turns the move into a render.
    const move = (e: PointerEvent) => {
      pointer.set({ x: e.clientX, y: e.clientY });
      on(e);
    };
    // A finger: the browser may stop sending pointer events once it thinks a touch is a scroll; touch events go on.
    const touch = (e: TouchEvent) => {
      const t = e.touches[0];
      if (t) pointer.set({ x: t.clientX, y: t.clientY });
    };
    window.addEventListener("keydown", on);
    window.addEventListener("keyup", on);
    window.addEventListener("pointermove", move, { capture: true });
    window.addEventListener("touchstart", touch, { capture: true, passive: true });
    window.addEventListener("touchmove", touch, { capture: true, passive: true });
    return () => {
      window.removeEventListener("keydown", on);
      window.removeEventListener("keyup", on);
      window.removeEventListener("pointermove", move, { capture: true });
      window.removeEventListener("touchstart", touch, { capture: true });
      window.removeEventListener("touchmove", touch, { capture: true });
    };
  }, [alt, armed, dragging, pointer, previewNow]);

  const onDragCancel = useCallback(() => {
    dragging.set(null);
    setActive(null);
    setHover(null);
  }, [dragging, setHover]);

  const onDragEnd = useCallback(
    (e: DragEndEvent) => {
      const w = week.get();
      const data = e.active.data.current as DragData | undefined;
      const target = cellNow();
      pointed.set(target);
      const copy = data ? copies(data.source) : false;
      onDragCancel();
      if (!w || !data) return;
      if (data.source.type === "session" && armed.get() === data.source.sessionId) armCopy(null);
      const outcome = resolveDrop({ week: w, source: data.source, target, copy });
      if (!outcome) return;
      if (!outcome.ok) return onRefused(outcome.reason);
      onDrop(outcome.change, changeHits(w, outcome.change));
    },
    [armCopy, armed, cellNow, copies, onDragCancel, onDrop, onRefused, pointed, week],
  );

  const copying = active?.source.type === "session" && (altDown || copyArmedId === active.source.sessionId);
  return {
    sensors,
    accessibility,
    onDragStart,
    onDragMove,
    onDragEnd,
    onDragCancel,
    active,
    hoverStore,
    altDown,
    copying,
    copyArmedId,
    armCopy,
  };
}
