"use client";

import { DndContext, DragOverlay, KeyboardSensor, PointerSensor, useSensor, useSensors, type DragEndEvent, type DragOverEvent, type DragStartEvent } from "@dnd-kit/core";
import { clsx } from "clsx";
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import useSWR from "swr";
import { LoadCaution } from "@/components/ui/caution";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import { formatNumber } from "@/lib/format/number";
import { findSession, resolveDrop, type DragSource, type DropTarget } from "@/lib/plan/drop";
import { planWeekKey } from "@/lib/plan/keys";
import { previewChange, type RowPreview } from "@/lib/plan/preview";
import { restrictionsFor } from "@/lib/plan/restrictions";
import { typicalProfile } from "@/lib/plan/typical";
import type { PlanSession, PlanTemplate, PlanWeek } from "@/lib/plan/types";
import { teamWeekStart } from "@/lib/plan/week";
import { fetchWeek } from "./api";
import { BlockShelf } from "./block-shelf";
import { announcements, dragId, dropId, gridKeyboardCoordinates, plannerCollision, SCREEN_READER_INSTRUCTIONS, type DragData, type DropData, type GridLayout } from "./dnd";
import { describeChange, targetLabel } from "./describe";
import { groupKey } from "./group-row";
import { SessionCard, type CardActions } from "./session-card";
import { SessionEditor } from "./session-editor";
import { TemplateCard } from "./template-card";
import { TemplateEditor } from "./template-editor";
import { usePlanActions } from "./use-plan-actions";
import { WeekGrid } from "./week-grid";
import { DropPreviewPanel } from "./drop-preview-panel";
import { NoticeToast } from "./notice-toast";
import { WeekHeader } from "./week-header";

/** Set by scripts/bench-planner.ts (addInitScript); the page records its own timings into it. */
type PerfLog = { previews: number[]; compute?: number[]; saved?: number[]; confirmed?: number[] };
declare global {
  interface Window {
    __plannerPerf?: PerfLog;
  }
}

type Hover = { source: DragSource; target: DropTarget; rows: Map<number, RowPreview>; refusal: string | null; text: string };

// Only the page scrolls while dragging (vertically); watching the grid's own scroll box costs frames.
const AUTO_SCROLL = { threshold: { x: 0, y: 0.12 }, canScroll: (el: Element) => el === document.scrollingElement };

const NO_PREVIEWS: ReadonlyMap<number, RowPreview> = new Map();

export function Planner({ teamId, initialWeek, initial }: { teamId: number; initialWeek: string; initial: PlanWeek | null }) {
  const [weekStart, setWeekStart] = useState(initialWeek);
  const key = planWeekKey(teamId, weekStart);
  const { data: week, error, isLoading, isValidating } = useSWR<PlanWeek>(key, fetchWeek, {
    fallbackData: initial && initial.weekStart === weekStart ? initial : undefined,
    revalidateOnMount: !(initial && initial.weekStart === weekStart),
    revalidateOnFocus: false,
    keepPreviousData: true,
  });
  const weekRef = useRef(week);
  weekRef.current = week;
  const current = useCallback(() => weekRef.current, []);
  const act = usePlanActions({ swrKey: key, current });
  const shown = week && week.weekStart === weekStart ? week : undefined;

  const [collapsed, setCollapsed] = useState<Set<string>>(new Set());
  const [shelfOpen, setShelfOpen] = useState(true);
  const [hover, setHover] = useState<Hover | null>(null);
  const [active, setActive] = useState<DragData | null>(null);
  const [altDown, setAltDown] = useState(false);
  const altRef = useRef(false);
  const [copyArmedId, setCopyArmedId] = useState<number | null>(null);
  const [editing, setEditing] = useState<number | null>(null);
  const [templateEditor, setTemplateEditor] = useState<{ open: boolean; template: PlanTemplate | null }>({ open: false, template: null });
  const perfStart = useRef<number | null>(null);
  const [ready, setReady] = useState(false);
  const dropStart = useRef<number | null>(null);
  useEffect(() => setReady(true), []);

  const go = useCallback(
    (date: string) => {
      const start = teamWeekStart(date, weekRef.current?.weekStartDay ?? 1);
      setWeekStart(start);
      act.clearUndo();
      window.history.replaceState(null, "", `/plan?week=${start}`);
    },
    [act],
  );

  // The copy modifier: Alt held while dropping copies instead of moving.
  useEffect(() => {
    const on = (e: KeyboardEvent | PointerEvent) => {
      const down = e.altKey;
      if (down !== altRef.current) {
        altRef.current = down;
        setAltDown(down);
      }
    };
    window.addEventListener("keydown", on);
    window.addEventListener("keyup", on);
    window.addEventListener("pointermove", on);
    return () => {
      window.removeEventListener("keydown", on);
      window.removeEventListener("keyup", on);
      window.removeEventListener("pointermove", on);
    };
  }, []);

  // Ctrl/⌘+Z undoes the last change (not while typing in a field).
  const undoRef = useRef(act.undo);
  undoRef.current = act.undo;
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape" && !activeRef.current) setCopyArmedId(null);
      const typing = e.target instanceof HTMLElement && /^(INPUT|TEXTAREA|SELECT)$/.test(e.target.tagName);
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "z" && !typing && !document.querySelector("dialog[open]")) {
        e.preventDefault();
        void undoRef.current();
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);

  const layout = useCallback((): GridLayout => {
    const w = weekRef.current;
    if (!w) return { rows: [], days: [] };
    const rows: GridLayout["rows"] = [];
    for (const g of w.groups) {
      if (g.id !== null && w.scope === "team") rows.push({ key: `group:${g.id}`, target: (date) => ({ type: "group", groupId: g.id!, date }) });
      if (collapsedRef.current.has(groupKey(g))) continue;
      for (const id of g.athleteIds) rows.push({ key: `athlete:${id}`, target: (date) => ({ type: "cell", athleteId: id, date }) });
    }
    return { rows, days: w.days };
  }, []);
  const collapsedRef = useRef(collapsed);
  collapsedRef.current = collapsed;
  const activeRef = useRef<DragData | null>(null);
  const keyMoves = useRef(0);
  const startTarget = useCallback(() => {
    const src = activeRef.current?.source;
    const w = weekRef.current;
    const s = src?.type === "session" && w ? findSession(w, src.sessionId) : null;
    const origin: DropTarget | null = s ? { type: "cell", athleteId: s.athleteId, date: s.date } : null;
    return { origin, moves: keyMoves.current++ };
  }, []);
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 5 } }),
    useSensor(KeyboardSensor, { coordinateGetter: gridKeyboardCoordinates(layout, startTarget) }),
  );

  // dnd-kit asks twice per new target (the grid's onDragOver and the screen-reader announcement): compute once.
  const lastPreview = useRef<{ week: PlanWeek; key: string; outcome: ReturnType<typeof resolveDrop>; rows: RowPreview[] } | null>(null);
  const previewFor = useCallback((w: PlanWeek, source: DragSource, target: DropTarget, copy: boolean) => {
    const key = `${dragId(source)}>${dropId(target)}:${copy}`;
    if (lastPreview.current?.week === w && lastPreview.current.key === key) return lastPreview.current;
    const outcome = resolveDrop({ week: w, source, target, copy });
    const rows = outcome?.ok ? previewChange(w, outcome.change) : [];
    lastPreview.current = { week: w, key, outcome, rows };
    return lastPreview.current;
  }, []);

  const isCopy = useCallback((src: DragSource) => altRef.current || (src.type === "session" && copyArmedId === src.sessionId), [copyArmedId]);

  const describeOver = useCallback(
    (source: DragSource, target: DropTarget): string => {
      const w = weekRef.current;
      if (!w) return "";
      const { outcome, rows } = previewFor(w, source, target, isCopy(source));
      const where = targetLabel(w, target);
      if (!outcome) return `Over ${where}, where it already is.`;
      if (!outcome.ok) return `Over ${where}. Cannot drop here: ${outcome.reason}`;
      const parts = rows.map((r) => {
        const name = w.athletes.find((a) => a.id === r.athleteId)?.name ?? "";
        const warn = r.warnings.map((f) => `${FLAG_DISPLAY[f.kind].label}: ${f.reason}`).join(" ");
        return `${name}: sRPE ${formatNumber(r.before.week.totals.srpe, 0)} to ${formatNumber(r.after.week.totals.srpe, 0)} AU.${warn ? ` ${warn}` : ""}`;
      });
      return `Over ${where}. Dropping makes ${describeChange(w, outcome.change)}. ${parts.join(" ")}`;
    },
    [isCopy, previewFor],
  );
  const accessibility = useMemo(() => ({ announcements: announcements(describeOver), screenReaderInstructions: { draggable: SCREEN_READER_INSTRUCTIONS } }), [describeOver]);

  const onDragStart = useCallback((e: DragStartEvent) => {
    const data = e.active.data.current as DragData | undefined;
    activeRef.current = data ?? null;
    keyMoves.current = 0;
    setActive(data ?? null);
  }, []);

  const onDragOver = useCallback(
    (e: DragOverEvent) => {
      const w = weekRef.current;
      const data = e.active.data.current as DragData | undefined;
      const target = (e.over?.data.current as DropData | undefined)?.target;
      if (!w || !data || !target) {
        setHover(null);
        return;
      }
      perfStart.current = performance.now();
      const { outcome, rows: list } = previewFor(w, data.source, target, isCopy(data.source));
      window.__plannerPerf?.compute?.push(performance.now() - perfStart.current);
      const rows = new Map<number, RowPreview>(list.map((r) => [r.athleteId, r]));
      setHover({ source: data.source, target, rows, refusal: outcome && !outcome.ok ? outcome.reason : null, text: outcome?.ok ? describeChange(w, outcome.change) : "" });
    },
    [isCopy, previewFor],
  );

  useLayoutEffect(() => {
    if (perfStart.current === null) return;
    const ms = performance.now() - perfStart.current;
    perfStart.current = null;
    window.__plannerPerf?.previews.push(ms);
  }, [hover]);

  // Benchmark only: from a drop to the server's numbers on screen (the refetch after the save has landed).
  useEffect(() => {
    if (isValidating || dropStart.current === null || act.saving > 0) return;
    const t0 = dropStart.current;
    dropStart.current = null;
    requestAnimationFrame(() => window.__plannerPerf?.confirmed?.push(performance.now() - t0));
  }, [isValidating, act.saving]);

  const endDrag = useCallback(() => {
    activeRef.current = null;
    setActive(null);
    setHover(null);
  }, []);

  const onDragEnd = useCallback(
    (e: DragEndEvent) => {
      const w = weekRef.current;
      const data = e.active.data.current as DragData | undefined;
      const target = (e.over?.data.current as DropData | undefined)?.target ?? null;
      endDrag();
      if (!w || !data) return;
      const copy = isCopy(data.source);
      if (data.source.type === "session" && copyArmedId === data.source.sessionId) setCopyArmedId(null);
      const outcome = resolveDrop({ week: w, source: data.source, target, copy });
      if (!outcome) return;
      if (!outcome.ok) {
        act.say("refused", outcome.reason);
        return;
      }
      const t0 = performance.now();
      dropStart.current = t0;
      void act.saveChange(outcome.change).then(() => requestAnimationFrame(() => window.__plannerPerf?.saved?.push(performance.now() - t0)));
    },
    [act, copyArmedId, endDrag, isCopy],
  );

  const toggleGroup = useCallback((k: string) => setCollapsed((c) => {
    const next = new Set(c);
    if (next.has(k)) next.delete(k);
    else next.add(k);
    return next;
  }), []);

  const { deleteSession, say } = act;
  const actions: CardActions = useMemo(
    () => ({
      open: (s: PlanSession) => setEditing(s.id),
      armCopy: (s: PlanSession) => {
        setCopyArmedId(s.id);
        say("info", `Copy mode for "${s.title}": drag the card (or focus it, press Space and use the arrow keys) to where the copy should go.`);
      },
      remove: (s: PlanSession) => {
        const published = s.status === "published";
        if (!window.confirm(published ? `Cancel "${s.title}"? Athletes will see it cancelled.` : `Delete the draft "${s.title}"?`)) return;
        void deleteSession(s).catch((err: unknown) => say("refused", err instanceof Error ? err.message : "Could not delete"));
      },
    }),
    [deleteSession, say],
  );

  const editTemplate = useCallback((t: PlanTemplate) => setTemplateEditor({ open: true, template: t }), []);
  const newTemplate = useCallback(() => setTemplateEditor({ open: true, template: null }), []);
  const profiles = useMemo(() => shown?.athletes.map((a) => a.profile) ?? [], [shown]);
  const typical = useMemo(() => typicalProfile(profiles), [profiles]);
  const editingSession = shown && editing !== null ? findSession(shown, editing) : null;
  const editingAthlete = editingSession ? shown?.athletes.find((a) => a.id === editingSession.athleteId) : undefined;
  const previews = hover?.rows ?? NO_PREVIEWS;
  const overlaySession = active?.source.type === "session" && shown ? findSession(shown, active.source.sessionId) : null;
  const overlayTemplate = active?.source.type === "template" && shown ? shown.templates.find((t) => active.source.type === "template" && t.id === active.source.templateId) : undefined;
  const copying = active ? isCopy(active.source) && active.source.type === "session" : false;
  void restrictionsFor; // Seam: physio restrictions are checked here once that feature exists (none today).

  return (
    <div data-testid="planner" data-team-id={teamId} data-save-state={act.saving > 0 ? "saving" : isValidating ? "confirming" : "idle"} data-week={weekStart} data-ready={ready || undefined}>
      <WeekHeader week={shown} weekStart={weekStart} onGo={go} onToday={() => go(shown?.today ?? weekStart)} undo={act.undoStack.at(-1) ?? null} onUndo={() => void act.undo()} onTool={(t) => void act.runTool(t)} busy={act.saving > 0} />
      {active ? null : <NoticeToast notice={act.notice} />}
      {error && !shown ? <p className="rounded-lg bg-flag-spike-soft px-3 py-2 text-sm text-flag-spike">The plan could not be loaded: {error instanceof Error ? error.message : "unknown error"}.</p> : null}
      {!shown && isLoading ? <div className="h-96 animate-pulse rounded-card bg-paper-sunk" data-testid="plan-loading" /> : null}
      {shown ? (
        <DndContext sensors={sensors} collisionDetection={plannerCollision} accessibility={accessibility} onDragStart={onDragStart} onDragOver={onDragOver} onDragEnd={onDragEnd} onDragCancel={endDrag} autoScroll={AUTO_SCROLL}>
          {!shown.canEdit ? (
            <p className="mb-3 rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600" data-testid="read-only">
              {shown.scope === "own" ? "Your published sessions this week. Coaches plan them; open a card to see what it asks." : "Read-only: coaches and the head coach change the plan. Open a card to see its blocks."}
            </p>
          ) : null}
          {hover && (hover.refusal || hover.text) ? (
            <DropPreviewPanel week={shown} text={hover.text} refusal={hover.refusal} rows={[...hover.rows.values()]} copying={copying} />
          ) : null}
          <div className="mb-2 flex items-center justify-between gap-3">
            <p data-testid="drag-hint" data-active={active ? "true" : undefined} className={clsx("min-h-4 text-xs", active ? "text-ink-600" : "text-ink-400")}>
              {active
                ? active.source.type === "session"
                  ? copying
                    ? "Copying: drop on a day."
                    : "Moving: drop on a day. Hold Alt to copy instead."
                  : "Drop on an athlete's day, or on a group's row for the whole group."
                : shown.canEdit
                  ? "Drag a block onto a day · drag a card to move it (Alt copies) · Ctrl+Z undoes"
                  : ""}
            </p>
            {shown.canEdit ? (
              <button type="button" aria-expanded={shelfOpen} aria-controls="block-shelf" onClick={() => setShelfOpen((o) => !o)} data-testid="toggle-shelf" className="shrink-0 text-xs font-medium text-ink-500 hover:text-ink-900">
                {shelfOpen ? "Hide block shelf ›" : "‹ Show block shelf"}
              </button>
            ) : null}
          </div>
          <div className={clsx("grid gap-4", shown.canEdit && shelfOpen ? "lg:grid-cols-[minmax(0,1fr)_13.5rem]" : "")}>
            <div className="min-w-0 space-y-3">
              {shown.athletes.length === 0 ? (
                <p className="rounded-card border border-dashed border-ink-200 px-6 py-10 text-center text-sm text-ink-500">No athletes in the team yet. Add them on the squad screen.</p>
              ) : (
                <WeekGrid week={shown} collapsed={collapsed} onToggleGroup={toggleGroup} previews={previews} templateDrag={active?.source.type === "template"} copyArmedId={copyArmedId} actions={actions} />
              )}
              <LoadCaution />
              <p className="text-2xs text-ink-400">
                Totals are for the week as planned (logged work up to today, the plan after). HSR and near-max metres and sprint steps are model estimates from each athlete&apos;s tested max velocity.
              </p>
            </div>
            {shown.canEdit && shelfOpen ? <BlockShelf templates={shown.templates} canEdit onEdit={editTemplate} onNew={newTemplate} /> : null}
          </div>
          <DragOverlay dropAnimation={null}>
            {overlaySession ? (
              <div className="relative">
                <SessionCard session={overlaySession} athleteName="" canEdit={false} copyArmed={false} flags={[]} actions={actions} overlay />
                {altDown || copying ? <span className="absolute -right-2 -top-2 rounded-full bg-lane-600 px-1.5 text-2xs font-semibold text-white">+ copy</span> : null}
              </div>
            ) : overlayTemplate ? (
              <ul>
                <TemplateCard template={overlayTemplate} canEdit={false} onEdit={() => {}} overlay />
              </ul>
            ) : null}
          </DragOverlay>
        </DndContext>
      ) : null}
      {shown ? (
        <>
          <SessionEditor
            session={editingSession}
            athleteName={editingAthlete?.name ?? ""}
            canEdit={shown.canEdit}
            templates={shown.templates}
            onClose={() => setEditing(null)}
            onSave={act.saveSession}
            onDelete={(s, version) => act.deleteSession(s, version)}
          />
          <TemplateEditor
            open={templateEditor.open}
            template={templateEditor.template}
            onClose={() => setTemplateEditor({ open: false, template: null })}
            onSave={act.saveTemplate}
            onDelete={(t) => act.deleteTemplate(t.id, t.title)}
            profile={typical}
            settings={shown.settings}
          />
        </>
      ) : null}
    </div>
  );
}
