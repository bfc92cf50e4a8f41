import { describe, expect, it } from "vitest";
import { applyChange, mergeSaved, sessionsAfter, tempIdCounter } from "@/lib/plan/apply";
import { popUndo, pushUndo, undoForChange, undoForDelete, undoForEdit, type UndoEntry } from "@/lib/plan/undo";
import { findSession } from "@/lib/plan/drop";
import { addDays } from "@/lib/dates/plain-date";
import { WEEK, history, planWeek, session } from "./fixtures";

const tue = addDays(WEEK, 1);
const thu = addDays(WEEK, 3);
const maya = session(1, tue);
const week = planWeek([
  { id: 1, name: "Maya", groupId: 10, past: history(1), sessions: [maya] },
  { id: 2, name: "Jonah", groupId: 10, past: history(2), sessions: [] },
]);

describe("applyChange: the grid while a save is on its way", () => {
  it("a template drop adds a draft made from the template (16:00, its duration and RPE) with a temporary id", () => {
    const next = applyChange(week, { kind: "create", templateId: 1, athleteId: 2, date: thu }, tempIdCounter());
    const [s] = next.athletes[1].sessions;
    expect(s).toMatchObject({
      id: -1,
      athleteId: 2,
      date: thu,
      startTime: "16:00",
      title: "Flying 30s",
      durationMin: 50,
      plannedRpe: 7,
      status: "draft",
    });
    expect(s.blocks).toEqual([expect.objectContaining({ id: -2, kind: "max_velocity", templateId: 1 })]);
    expect(next.athletes[0]).toBe(week.athletes[0]);
  });

  it("adds a block at the end, moves between athletes, and copies with new ids", () => {
    const added = sessionsAfter(
      week,
      { kind: "add-block", templateId: 2, sessionId: maya.id, athleteId: 1, date: tue },
      tempIdCounter(),
    );
    expect(added.get(1)![0].blocks.map((b) => [b.kind, b.position])).toEqual([
      ["acceleration", 0],
      ["plyometric", 1],
    ]);
    const moved = sessionsAfter(
      week,
      { kind: "move", sessionId: maya.id, athleteId: 2, date: thu, fromAthleteId: 1, fromDate: tue },
      tempIdCounter(),
    );
    expect(moved.get(1)).toEqual([]);
    expect(moved.get(2)).toEqual([{ ...maya, athleteId: 2, date: thu }]);
    const copied = sessionsAfter(week, { kind: "copy", sessionId: maya.id, athleteId: 1, date: thu }, tempIdCounter());
    expect(copied.get(1)!.map((s) => s.id)).toEqual([maya.id, -2]);
    expect(copied.get(1)![1].blocks[0].id).toBe(-1);
  });

  it("merges the server's answer in place of the optimistic sessions", () => {
    const optimistic = applyChange(week, { kind: "create", templateId: 1, athleteId: 2, date: thu }, tempIdCounter());
    const saved = { ...optimistic.athletes[1].sessions[0], id: 77, version: 1 };
    const merged = mergeSaved(optimistic, [saved], [], [-1]);
    expect(merged.athletes[1].sessions.map((s) => s.id)).toEqual([77]);
    const removed = mergeSaved(merged, [], [77]);
    expect(removed.athletes[1].sessions).toEqual([]);
  });
});

describe("undo", () => {
  const after = (s: typeof maya) => ({ sessions: [s], removedIds: [] });

  it("takes back each kind of drop", () => {
    const prior = (id: number) => findSession(week, id) ?? undefined;
    expect(
      undoForChange(
        { kind: "move", sessionId: maya.id, athleteId: 2, date: thu, fromAthleteId: 1, fromDate: tue },
        prior,
        after({ ...maya, athleteId: 2, date: thu }),
      ).ops,
    ).toEqual([{ op: "move", sessionId: maya.id, athleteId: 1, date: tue }]);
    expect(
      undoForChange(
        { kind: "create", templateId: 1, athleteId: 2, date: thu },
        prior,
        after(session(2, thu, { id: 50 })),
      ).ops,
    ).toEqual([{ op: "remove", sessionId: 50 }]);
    const withBlock = { ...maya, blocks: [...maya.blocks, { ...maya.blocks[0], id: 900, position: 1 }] };
    expect(
      undoForChange(
        { kind: "add-block", templateId: 2, sessionId: maya.id, athleteId: 1, date: tue },
        prior,
        after(withBlock),
      ).ops,
    ).toEqual([{ op: "remove-block", sessionId: maya.id, blockId: 900 }]);
    const group = undoForChange(
      {
        kind: "group",
        templateId: 2,
        groupId: 10,
        date: tue,
        targets: [
          { athleteId: 1, sessionId: maya.id },
          { athleteId: 2, sessionId: null },
        ],
      },
      prior,
      { sessions: [withBlock, session(2, tue, { id: 51 })], removedIds: [] },
    );
    expect(group.ops).toEqual([
      { op: "remove-block", sessionId: maya.id, blockId: 900 },
      { op: "remove", sessionId: 51 },
    ]);
  });

  it("writes a deleted draft again, and brings back a cancelled one", () => {
    expect(undoForDelete(maya, { sessions: [], removedIds: [maya.id] }).ops).toEqual([
      { op: "recreate", session: maya },
    ]);
    expect(undoForDelete(maya, { sessions: [{ ...maya, status: "cancelled" }], removedIds: [] }).ops).toEqual([
      { op: "reinstate", sessionId: maya.id },
    ]);
    expect(undoForEdit(maya).ops[0]).toMatchObject({
      op: "restore-fields",
      fields: { title: maya.title, blocks: maya.blocks },
    });
  });

  it("is a bounded last-in-first-out stack", () => {
    let stack: UndoEntry[] = [];
    for (let i = 0; i < 25; i++) stack = pushUndo(stack, { label: `e${i}`, ops: [{ op: "remove", sessionId: i }] });
    expect(stack).toHaveLength(20);
    expect(pushUndo(stack, { label: "empty", ops: [] })).toHaveLength(20);
    const { entry, rest } = popUndo(stack);
    expect(entry?.label).toBe("e24");
    expect(rest).toHaveLength(19);
    expect(popUndo([])).toEqual({ entry: null, rest: [] });
  });
});
