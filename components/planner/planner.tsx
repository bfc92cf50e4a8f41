"use client";

import { DndContext, DragOverlay } from "@dnd-kit/core";
import { clsx } from "clsx";
import { useCallback, useEffect, useMemo, useState, useSyncExternalStore } from "react";
import useSWR from "swr";
import { WeekPrint } from "@/components/print/week-print";
import { LoadCaution } from "@/components/ui/caution";
import { Segmented } from "@/components/ui/segmented";
import { fetchJson } from "@/lib/client/fetcher";
import { planKeys } from "@/lib/client/keys";
import { findSession, type PlanChange } from "@/lib/plan/drop";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { plausibilityLines, type PlausibilityCheck } from "@/lib/plan/plausibility";
import { typicalProfile } from "@/lib/plan/typical";
import type { PlanSession, PlanTemplate, PlanWeek } from "@/lib/plan/types";
import { startOfWeek } from "@/lib/dates/plain-date";
import { BlockShelf } from "./block-shelf";
import { ConfirmProvider, removeQuestion, useConfirm } from "./confirm";
import { describeChange } from "./describe";
import { DropPreviewPanel } from "./drop-preview-panel";
import { useLatest } from "./latest";
import { NoticeToast } from "./notice-toast";
import { OverrideProvider, useOverrideReason } from "./override-dialog";
import { PhoneSquadDay } from "./phone-squad-day";
import { PhoneWeek } from "./phone-week";
import { SessionCard, type CardActions } from "./session-card";
import { SessionEditor } from "./session-editor";
import { TemplateCard } from "./template-card";
import { TemplateEditor } from "./template-editor";
import { usePlanActions } from "./use-plan-actions";
import { usePlannerDnd } from "./use-planner-dnd";
import { WeekGrid } from "./week-grid";
import { WeekHeader } from "./week-header";

// Only the page scrolls while dragging (vertically); watching the grid's own scroll box costs frames.
const AUTO_SCROLL = { threshold: { x: 0, y: 0.12 }, canScroll: (el: Element) => el === document.scrollingElement };
const noop = () => {};
// Off screen until focused (the first Tab on the page lands on it), then a plain visible link.
const SKIP_LINK =
  "sr-only rounded-md bg-ink-900 px-3 py-1.5 text-sm font-medium text-paper focus:not-sr-only focus:mb-2 focus:inline-block";
const subscribeNothing = () => noop;

const PHONE_QUERY = "(max-width: 767.98px)";
const subscribePhone = (cb: () => void) => {
  const m = window.matchMedia(PHONE_QUERY);
  m.addEventListener("change", cb);
  return () => m.removeEventListener("change", cb);
};

/** Below tablet width (Tailwind's md): the phone's week of one athlete instead of the grid. */
function usePhone() {
  return useSyncExternalStore(
    subscribePhone,
    () => window.matchMedia(PHONE_QUERY).matches,
    () => false,
  );
}

/** Moves focus to a landmark of the planner (skip links and their shortcuts), and shows it. */
function focusRegion(id: string) {
  const el = document.getElementById(id);
  if (!el) return;
  el.focus({ preventScroll: true });
  el.scrollIntoView({ block: "start" });
}

/** The phone's squad day: the one picked while it is in the week shown, else today when shown, else the first day. */
function phoneDayOf(week: PlanWeek, picked: string | null): string {
  if (picked && week.days.includes(picked)) return picked;
  return week.days.includes(week.today) ? week.today : week.days[0]!;
}

type PhoneView = "athlete" | "day";
/** On a phone: one athlete's week, or one day for the whole squad. */
const PHONE_VIEWS: [PhoneView, string][] = [
  ["athlete", "One athlete's week"],
  ["day", "The squad's day"],
];

function useHydrated() {
  return useSyncExternalStore(
    subscribeNothing,
    () => true,
    () => false,
  );
}

type PlannerProps = { teamId: number; initialWeek: string; initial: PlanWeek | null };

export function Planner(props: PlannerProps) {
  return (
    <ConfirmProvider>
      <OverrideProvider>
        <PlannerScreen {...props} />
      </OverrideProvider>
    </ConfirmProvider>
  );
}

function PlannerScreen({ teamId, initialWeek, initial }: PlannerProps) {
  const [weekStart, setWeekStart] = useState(initialWeek);
  const key = planKeys.week(teamId, weekStart);
  const seeded = initial !== null && initial.weekStart === weekStart;
  const {
    data: week,
    error,
    isLoading,
    isValidating,
  } = useSWR<PlanWeek>(key, fetchJson<PlanWeek>, {
    fallbackData: seeded ? initial : undefined,
    revalidateOnMount: !seeded,
    revalidateOnFocus: false,
    keepPreviousData: true,
  });
  const weekBox = useLatest(week);
  const current = useCallback(() => weekBox.get(), [weekBox]);
  const askReason = useOverrideReason();
  const askOverride = useCallback(
    (hits: RestrictionHit[], what: string) =>
      askReason({
        hits,
        what,
        athleteName: (id) => weekBox.get()?.athletes.find((a) => a.id === id)?.name ?? "The athlete",
      }),
    [askReason, weekBox],
  );
  const confirm = useConfirm();
  const askSure = useCallback(
    (checks: PlausibilityCheck[], what: string) =>
      confirm({
        title: "Are you sure?",
        body: `${plausibilityLines(checks)} Save ${what} with these numbers?`,
        confirmLabel: "Yes, save these numbers",
      }),
    [confirm],
  );
  const act = usePlanActions({ swrKey: key, current, askOverride, askSure });
  const shown = week && week.weekStart === weekStart ? week : undefined;
  const hydrated = useHydrated();

  const [collapsed, setCollapsed] = useState<ReadonlySet<string>>(new Set());
  const [shelfOpen, setShelfOpen] = useState(true);
  const [editing, setEditing] = useState<number | null>(null);
  const [templateEditor, setTemplateEditor] = useState<{ open: boolean; template: PlanTemplate | null }>({
    open: false,
    template: null,
  });
  const collapsedBox = useLatest(collapsed);
  const phone = usePhone();
  const [phoneAthleteId, setPhoneAthleteId] = useState<number | null>(null);
  const [phoneView, setPhoneView] = useState<PhoneView>("athlete");
  const [phoneDayPicked, setPhoneDay] = useState<string | null>(null);
  const squadDay = phone && phoneView === "day" && shown ? phoneDayOf(shown, phoneDayPicked) : null;
  const phoneAthlete = phone && squadDay === null ? (phoneAthleteId ?? shown?.athletes[0]?.id ?? null) : null;
  const phoneAthleteBox = useLatest(phoneAthlete);
  const phoneDayBox = useLatest(squadDay);
  const { say, saveChange, deleteSession, clearUndo } = act;

  const onDrop = useCallback(
    (change: PlanChange, hits: RestrictionHit[]) => {
      const save = (override?: { reason: string }) => {
        void saveChange(change, override);
      };
      if (hits.length === 0) return save();
      // Warned while hovering; the drop itself asks why before anything is saved.
      const w = weekBox.get();
      const what = w ? describeChange(w, change) : "this session";
      void askOverride(hits, what).then((reason) =>
        reason === null ? say("info", `Not planned: ${what}. The restriction stands.`) : save({ reason }),
      );
    },
    [askOverride, saveChange, say, weekBox],
  );
  const onRefused = useCallback((reason: string) => say("refused", reason), [say]);
  const dnd = usePlannerDnd({
    week: weekBox,
    collapsed: collapsedBox,
    phoneAthlete: phoneAthleteBox,
    phoneDay: phoneDayBox,
    onDrop,
    onRefused,
  });

  // Skip-link shortcuts: Alt+Shift+B to the block shelf, Alt+Shift+G to the days (the key, whatever the layout).
  const openShelf = useCallback(() => {
    setShelfOpen(true);
    requestAnimationFrame(() => focusRegion("block-shelf"));
  }, []);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!e.altKey || !e.shiftKey || e.ctrlKey || e.metaKey) return;
      if (e.code === "KeyB") {
        e.preventDefault();
        openShelf();
      } else if (e.code === "KeyG") {
        e.preventDefault();
        focusRegion("plan-days");
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [openShelf]);

  // Ctrl/⌘+Z undoes the last change (not while typing in a field or in a dialog).
  const undoBox = useLatest(act.undo);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const typing = e.target instanceof HTMLElement && /^(INPUT|TEXTAREA|SELECT)$/.test(e.target.tagName);
      if (
        (e.ctrlKey || e.metaKey) &&
        e.key.toLowerCase() === "z" &&
        !typing &&
        !document.querySelector("dialog[open]")
      ) {
        e.preventDefault();
        void undoBox.get()();
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [undoBox]);

  const go = useCallback(
    (date: string) => {
      const start = startOfWeek(date, weekBox.get()?.weekStartDay ?? 1);
      setWeekStart(start);
      clearUndo();
      window.history.replaceState(null, "", `/plan?week=${start}`);
    },
    [clearUndo, weekBox],
  );

  const toggleGroup = useCallback(
    (k: string) =>
      setCollapsed((c) => {
        const next = new Set(c);
        if (next.has(k)) next.delete(k);
        else next.add(k);
        return next;
      }),
    [],
  );

  const { armCopy } = dnd;
  const actions: CardActions = useMemo(
    () => ({
      open: (s: PlanSession) => setEditing(s.id),
      armCopy: (s: PlanSession) => {
        armCopy(s.id);
        say(
          "info",
          `Copy mode for "${s.title}": drag the card (or focus it, press Space and use the arrow keys) ` +
            `to where the copy goes. Escape leaves copy mode.`,
        );
      },
      remove: async (s: PlanSession) => {
        if (!(await confirm(removeQuestion(s)))) return;
        await deleteSession(s).catch((err: unknown) =>
          say("refused", err instanceof Error ? err.message : "Could not delete"),
        );
      },
    }),
    [armCopy, confirm, deleteSession, say],
  );

  const editTemplate = useCallback((t: PlanTemplate) => setTemplateEditor({ open: true, template: t }), []);
  const newTemplate = useCallback(() => setTemplateEditor({ open: true, template: null }), []);
  const profiles = useMemo(() => shown?.athletes.map((a) => a.profile) ?? [], [shown]);
  const typical = useMemo(() => typicalProfile(profiles), [profiles]);
  const editingSession = shown && editing !== null ? findSession(shown, editing) : null;
  const editingAthlete = editingSession ? shown?.athletes.find((a) => a.id === editingSession.athleteId) : undefined;
  const { active, hoverStore, copying } = dnd;
  const overlaySession =
    active?.source.type === "session" && shown ? findSession(shown, active.source.sessionId) : null;
  const overlayTemplateId = active?.source.type === "template" ? active.source.templateId : null;
  const overlayTemplate = shown?.templates.find((t) => t.id === overlayTemplateId);

  return (
    <div
      className="print:*:hidden"
      data-testid="planner"
      data-team-id={teamId}
      data-save-state={act.saving > 0 ? "saving" : isValidating ? "confirming" : "idle"}
      data-week={weekStart}
      data-ready={hydrated || undefined}
      data-layout={phone ? "phone" : "grid"}
    >
      <nav aria-label="Skip to" className="flex gap-2" data-testid="skip-links">
        {shown?.canEdit ? (
          <a
            href="#block-shelf"
            onClick={(e) => {
              e.preventDefault();
              openShelf();
            }}
            className={SKIP_LINK}
            data-testid="skip-shelf"
            aria-keyshortcuts="Alt+Shift+B"
          >
            Skip to the block shelf (Alt+Shift+B)
          </a>
        ) : null}
        <a
          href="#plan-days"
          onClick={(e) => {
            e.preventDefault();
            focusRegion("plan-days");
          }}
          className={SKIP_LINK}
          data-testid="skip-days"
          aria-keyshortcuts="Alt+Shift+G"
        >
          Skip to the days (Alt+Shift+G)
        </a>
      </nav>
      <WeekHeader
        week={shown}
        weekStart={weekStart}
        onGo={go}
        onToday={() => go(shown?.today ?? weekStart)}
        undo={act.undoStack.at(-1) ?? null}
        onUndo={() => void act.undo()}
        onTool={(t) => void act.runTool(t)}
        busy={act.saving > 0}
      />
      {active ? null : <NoticeToast notice={act.notice} />}
      {error && !shown ? (
        <p className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">
          The plan could not be loaded: {error instanceof Error ? error.message : "unknown error"}.
        </p>
      ) : null}
      {!shown && isLoading ? (
        <div className="h-96 animate-pulse rounded-card bg-paper-sunk" data-testid="plan-loading" />
      ) : null}
      {shown ? (
        <DndContext
          sensors={dnd.sensors}
          accessibility={dnd.accessibility}
          onDragStart={dnd.onDragStart}
          onDragMove={dnd.onDragMove}
          onDragEnd={dnd.onDragEnd}
          onDragCancel={dnd.onDragCancel}
          autoScroll={AUTO_SCROLL}
        >
          {!shown.canEdit ? (
            <p className="mb-3 rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600" data-testid="read-only">
              {shown.scope === "own"
                ? "Your published sessions this week. Coaches plan them; open a card to see what it asks."
                : "Read-only: coaches and the head coach change the plan. Open a card to see its blocks."}
            </p>
          ) : null}
          <DropPreviewPanel store={hoverStore} week={shown} copying={copying} />
          <div className="mb-2 flex items-center justify-between gap-3">
            <DragHint active={active?.source.type ?? null} copying={copying} canEdit={shown.canEdit} />
            {shown.canEdit ? (
              <button
                type="button"
                aria-expanded={shelfOpen}
                aria-controls="block-shelf"
                onClick={() => setShelfOpen((o) => !o)}
                data-testid="toggle-shelf"
                className="shrink-0 text-xs font-medium text-ink-500 hover:text-ink-900"
              >
                {shelfOpen ? "Hide block shelf ›" : "‹ Show block shelf"}
              </button>
            ) : null}
          </div>
          <div
            className={clsx(
              // One column that never grows past the screen (the shelf's row of cards scrolls inside it).
              "grid grid-cols-[minmax(0,1fr)] gap-4",
              shown.canEdit && shelfOpen ? "xl:grid-cols-[minmax(0,1fr)_13.5rem]" : "",
            )}
          >
            <div
              id="plan-days"
              role="region"
              tabIndex={-1}
              className="min-w-0 space-y-3 outline-none"
              aria-label="Days"
            >
              {shown.athletes.length === 0 ? (
                <p className="rounded-card border border-dashed border-ink-200 px-6 py-10 text-center text-sm text-ink-500">
                  No athletes in the team yet. Add them on the squad screen.
                </p>
              ) : phone ? (
                <Segmented
                  label="Show"
                  testId="phone-view"
                  value={squadDay === null ? "athlete" : "day"}
                  options={PHONE_VIEWS}
                  onChange={setPhoneView}
                />
              ) : null}
              {shown.athletes.length === 0 ? null : squadDay !== null ? (
                <PhoneSquadDay
                  week={shown}
                  day={squadDay}
                  onDay={setPhoneDay}
                  hoverStore={hoverStore}
                  copyArmedId={dnd.copyArmedId}
                  actions={actions}
                />
              ) : phoneAthlete !== null ? (
                <PhoneWeek
                  week={shown}
                  athleteId={phoneAthlete}
                  onAthlete={setPhoneAthleteId}
                  hoverStore={hoverStore}
                  copyArmedId={dnd.copyArmedId}
                  actions={actions}
                />
              ) : (
                <WeekGrid
                  week={shown}
                  collapsed={collapsed}
                  onToggleGroup={toggleGroup}
                  hoverStore={hoverStore}
                  templateDrag={active?.source.type === "template"}
                  dragging={active !== null && shown.canEdit}
                  copyArmedId={dnd.copyArmedId}
                  actions={actions}
                />
              )}
              <LoadCaution />
              <p className="text-2xs text-ink-500">
                Totals are for the week as planned (logged work up to today, the plan after). HSR and near-max metres
                and sprint steps are model estimates from each athlete&apos;s tested max velocity.
              </p>
            </div>
            {shown.canEdit && shelfOpen ? (
              <BlockShelf templates={shown.templates} canEdit onEdit={editTemplate} onNew={newTemplate} />
            ) : null}
          </div>
          <DragOverlay dropAnimation={null} className="pointer-events-none">
            {overlaySession ? (
              <div className="relative">
                <SessionCard
                  session={overlaySession}
                  athleteName=""
                  canEdit={false}
                  copyArmed={false}
                  flags={[]}
                  actions={actions}
                  overlay
                />
                {copying ? (
                  <span className="absolute -top-2 -right-2 rounded-full bg-lane-600 px-1.5 text-2xs font-semibold text-white">
                    + copy
                  </span>
                ) : null}
              </div>
            ) : overlayTemplate ? (
              <ul>
                <TemplateCard template={overlayTemplate} canEdit={false} onEdit={noop} overlay />
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
            measured={shown.measured?.find((m) => m.sessionId === editingSession?.id) ?? null}
            canEdit={shown.canEdit}
            templates={shown.templates}
            onClose={() => setEditing(null)}
            onSave={act.saveSession}
            askSure={askSure}
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
      {shown ? <WeekPrint week={shown} /> : null}
    </div>
  );
}

function DragHint({
  active,
  copying,
  canEdit,
}: {
  active: "template" | "session" | null;
  copying: boolean;
  canEdit: boolean;
}) {
  const text =
    active === "session"
      ? copying
        ? "Copying: drop on a day."
        : "Moving: drop on a day. Hold Alt to copy instead."
      : active === "template"
        ? "Drop on an athlete's day, or on a group's row for the whole group."
        : canEdit
          ? "Drag a block onto a day · drag a card to move it (Alt copies) · Ctrl+Z undoes"
          : "";
  return (
    <p
      data-testid="drag-hint"
      data-active={active ? "true" : undefined}
      className={clsx("min-h-4 text-xs", active ? "text-ink-600" : "text-ink-500")}
    >
      {text}
    </p>
  );
}
