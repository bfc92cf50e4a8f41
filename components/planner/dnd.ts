import type { Active, Announcements, KeyboardCoordinateGetter } from "@dnd-kit/core";
import type { DragSource, DropTarget } from "@/lib/plan/drop";
import type { Latest } from "./latest";

// Ids and data the grid hands to dnd-kit, the cell under the item, and keyboard movement from cell to cell.
//
// The grid registers NO droppables with dnd-kit: dnd-kit re-renders every droppable and draggable whenever the
// zone under the item changes, which made each new cell cost a render of the whole grid. The planner finds
// the cell itself (the element under the pointer, or the cell the arrow keys aimed at), so a new cell costs
// only the preview: the panel, the row whose numbers change and the two cells whose outline moves.

export const dragId = (s: DragSource) =>
  s.type === "template" ? `template:${s.templateId}` : `session:${s.sessionId}`;
export const dropId = (t: DropTarget) =>
  t.type === "cell" ? `cell:${t.athleteId}:${t.date}` : `group:${t.groupId}:${t.date}`;
const rowKey = (t: DropTarget) => (t.type === "cell" ? `athlete:${t.athleteId}` : `group:${t.groupId}`);

export type DragData = { source: DragSource; label: string };

/** The cell element of a target, as the grid (or the phone's week) renders it (data-testid day-cell / group-cell). */
function cellElement(t: DropTarget): HTMLElement | null {
  const sel =
    t.type === "cell"
      ? `[data-testid="day-cell"][data-athlete-id="${t.athleteId}"]`
      : `[data-testid="group-cell"][data-group-id="${t.groupId}"]`;
  return document.querySelector<HTMLElement>(`${sel}[data-date="${t.date}"]`);
}

/** How close to the top or bottom of the window an aimed cell may come before the page scrolls it to the middle. */
const REVEAL_MARGIN_PX = 24;

/** Keeps the cell the keyboard aims at on screen (page and the grid's own sideways scroll), then its box. */
function revealCell(t: DropTarget): DOMRect | null {
  const el = cellElement(t);
  if (!el) return null;
  const r = el.getBoundingClientRect();
  // A cell at the very edge counts as off: the preview that follows can grow the rows above it by a line and
  // push it out again, so the aimed cell is brought to the middle rather than to the edge.
  const edge = REVEAL_MARGIN_PX;
  const off = r.top < edge || r.bottom > window.innerHeight - edge || r.left < 0 || r.right > window.innerWidth;
  if (off) el.scrollIntoView({ block: "center", inline: "nearest" });
  return el.getBoundingClientRect();
}

/** The drop cell at a viewport point, or null (the drag overlay ignores the pointer, so it never hides a cell). */
export function cellAtPoint(x: number, y: number): DropTarget | null {
  const td = document
    .elementFromPoint(x, y)
    ?.closest<HTMLElement>('[data-testid="day-cell"], [data-testid="group-cell"]');
  if (!td || td.dataset.drop !== "on") return null;
  const date = td.dataset.date!;
  if (td.dataset.athleteId) return { type: "cell", athleteId: Number(td.dataset.athleteId), date };
  return td.dataset.groupId ? { type: "group", groupId: Number(td.dataset.groupId), date } : null;
}

const ARROWS = ["ArrowRight", "ArrowLeft", "ArrowDown", "ArrowUp"];

/**
 * Rows (group headers and athletes, as rendered) and days: the grid the keyboard walks over. `vertical`: the
 * days are stacked (the phone's week of one athlete), so up and down change the day.
 */
export type GridLayout = {
  rows: { key: string; target: (date: string) => DropTarget }[];
  days: string[];
  vertical?: boolean;
};

/**
 * Arrow keys move the dragged item one day left/right or one row up/down, landing on the centre of that cell
 * (dnd-kit's default moves a fixed number of pixels, which lands between cells in a table).
 */
export function gridKeyboardCoordinates(
  layout: () => GridLayout,
  start: () => { origin: DropTarget | null; moves: number },
  aimed: Latest<DropTarget | null>,
): KeyboardCoordinateGetter {
  // The cell the last key press aimed at: the planner reads it as the cell under the item (`aimed`).
  let last: DropTarget | null = null;
  return (event, { context, currentCoordinates }) => {
    if (!ARROWS.includes(event.code)) return undefined;
    const { rows, days, vertical = false } = layout();
    if (rows.length === 0 || days.length === 0) return undefined;
    event.preventDefault();
    // The first press starts from the card's own day (a session) or lands on the first athlete's first day
    // (a template from the shelf); later presses move from the day the item is over.
    const { origin, moves } = start();
    if (moves === 0) {
      last = null;
      aimed.set(null);
    }
    const base = moves === 0 ? origin : (last ?? origin);
    let r = base ? rows.findIndex((row) => row.key === rowKey(base)) : -1;
    let d = base ? days.indexOf(base.date) : -1;
    if (r < 0 || d < 0) {
      r = Math.max(
        0,
        rows.findIndex((row) => row.key.startsWith("athlete:")),
      );
      d = 0;
    } else if (event.code === "ArrowRight" || (vertical && event.code === "ArrowDown"))
      d = Math.min(days.length - 1, d + 1);
    else if (event.code === "ArrowLeft" || (vertical && event.code === "ArrowUp")) d = Math.max(0, d - 1);
    else if (event.code === "ArrowDown") r = Math.min(rows.length - 1, r + 1);
    else r = Math.max(0, r - 1);
    last = rows[r].target(days[d]);
    aimed.set(last);
    const rect = revealCell(last);
    const size = context.collisionRect;
    if (!rect || !size) return currentCoordinates;
    return { x: rect.left + rect.width / 2 - size.width / 2, y: rect.top + rect.height / 2 - size.height / 2 };
  };
}

export const SCREEN_READER_INSTRUCTIONS =
  "To pick up a template or a session, press Space or Enter. Move with the arrow keys: left and right change the day, " +
  "up and down change the athlete or group. Hold Alt while dropping to copy a session instead of moving it. " +
  "Press Space or Enter to drop, or Escape to put it back.";

/**
 * Screen-reader lines. The cell under the item comes from `current()` (the planner tracks it from the
 * pointer or the keyboard), so moving along a row is announced even though dnd-kit's `over` (the row) stays.
 */
export function announcements(
  describeOver: (source: DragSource, target: DropTarget) => string,
  current: () => { target: DropTarget | null; label: string | null },
): Announcements {
  const label = (data: unknown) => (data as DragData | undefined)?.label ?? "item";
  let said: string | null = null;
  const over = (active: Active) => {
    const { target } = current();
    const key = target ? dropId(target) : "none";
    // Nothing new; and before the item first reaches a day, "Picked up …" stays the last word.
    if (key === said || (said === null && !target)) return undefined;
    said = key;
    const s = (active.data.current as DragData | undefined)?.source;
    return target && s ? describeOver(s, target) : `${label(active.data.current)} is not over a day.`;
  };
  return {
    onDragStart: ({ active }) => {
      said = null;
      return `Picked up ${label(active.data.current)}.`;
    },
    onDragMove: ({ active }) => over(active),
    onDragOver: ({ active }) => over(active),
    onDragEnd: ({ active }) => {
      const where = current().label;
      return where
        ? `Dropped ${label(active.data.current)} on ${where}.`
        : `${label(active.data.current)} was put back.`;
    },
    onDragCancel: ({ active }) => `Cancelled. ${label(active.data.current)} was put back.`,
  };
}
