import { closestCenter, pointerWithin, type Announcements, type CollisionDetection, type KeyboardCoordinateGetter } from "@dnd-kit/core";
import type { DragSource, DropTarget } from "@/lib/plan/drop";

// Ids and data the grid hands to dnd-kit, the collision rule, and keyboard movement from cell to cell.

export const dragId = (s: DragSource) => (s.type === "template" ? `template:${s.templateId}` : `session:${s.sessionId}`);
export const dropId = (t: DropTarget) => (t.type === "cell" ? `cell:${t.athleteId}:${t.date}` : `group:${t.groupId}:${t.date}`);
export const rowKey = (t: DropTarget) => (t.type === "cell" ? `athlete:${t.athleteId}` : `group:${t.groupId}`);

export type DragData = { source: DragSource; label: string };
export type DropData = { target: DropTarget; label: string };

/** The pointer decides for mouse and touch drags; keyboard drags have no pointer, so the nearest centre does. */
export const plannerCollision: CollisionDetection = (args) => (args.pointerCoordinates ? pointerWithin(args) : closestCenter(args));

const ARROWS = ["ArrowRight", "ArrowLeft", "ArrowDown", "ArrowUp"];

/** Rows (group headers and athletes, as rendered) and days: the grid the keyboard walks over. */
export type GridLayout = { rows: { key: string; target: (date: string) => DropTarget }[]; days: string[] };

/**
 * Arrow keys move the dragged item one day left/right or one row up/down, landing on the centre of that cell
 * (dnd-kit's default moves a fixed number of pixels, which lands between cells in a table).
 */
export function gridKeyboardCoordinates(layout: () => GridLayout, start: () => { origin: DropTarget | null; moves: number }): KeyboardCoordinateGetter {
  // The day the last key press aimed at: dnd-kit updates `over` only after the move, so quick presses use this.
  let last: DropTarget | null = null;
  return (event, { context, currentCoordinates }) => {
    if (!ARROWS.includes(event.code)) return undefined;
    const { rows, days } = layout();
    if (rows.length === 0 || days.length === 0) return undefined;
    event.preventDefault();
    // The first press starts from the card's own day (a session) or lands on the first athlete's first day
    // (a template from the shelf); later presses move from the day the item is over.
    const { origin, moves } = start();
    if (moves === 0) last = null;
    const base = moves === 0 ? origin : (last ?? (context.over?.data.current as DropData | undefined)?.target ?? origin);
    let r = base ? rows.findIndex((row) => row.key === rowKey(base)) : -1;
    let d = base ? days.indexOf(base.date) : -1;
    if (r < 0 || d < 0) {
      r = Math.max(0, rows.findIndex((row) => row.key.startsWith("athlete:")));
      d = 0;
    } else if (event.code === "ArrowRight") d = Math.min(days.length - 1, d + 1);
    else if (event.code === "ArrowLeft") d = Math.max(0, d - 1);
    else if (event.code === "ArrowDown") r = Math.min(rows.length - 1, r + 1);
    else r = Math.max(0, r - 1);
    last = rows[r].target(days[d]);
    const id = dropId(last);
    const rect = context.droppableContainers.get(id)?.rect.current ?? context.droppableRects.get(id);
    const size = context.collisionRect;
    if (!rect || !size) return currentCoordinates;
    return { x: rect.left + rect.width / 2 - size.width / 2, y: rect.top + rect.height / 2 - size.height / 2 };
  };
}

export const SCREEN_READER_INSTRUCTIONS =
  "To pick up a template or a session, press Space or Enter. Move with the arrow keys: left and right change the day, " +
  "up and down change the athlete or group. Hold Alt while dropping to copy a session instead of moving it. " +
  "Press Space or Enter to drop, or Escape to put it back.";

export function announcements(describeOver: (source: DragSource, target: DropTarget) => string): Announcements {
  const label = (data: unknown) => (data as DragData | undefined)?.label ?? "item";
  const target = (data: unknown) => (data as DropData | undefined)?.target ?? null;
  return {
    onDragStart: ({ active }) => `Picked up ${label(active.data.current)}.`,
    onDragOver: ({ active, over }) => {
      const t = target(over?.data.current);
      const s = (active.data.current as DragData | undefined)?.source;
      return t && s ? describeOver(s, t) : `${label(active.data.current)} is not over a day.`;
    },
    onDragEnd: ({ active, over }) => {
      const t = over?.data.current as DropData | undefined;
      return t ? `Dropped ${label(active.data.current)} on ${t.label}.` : `${label(active.data.current)} was put back.`;
    },
    onDragCancel: ({ active }) => `Cancelled. ${label(active.data.current)} was put back.`,
  };
}
