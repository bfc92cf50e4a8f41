"use client";

import { clsx } from "clsx";
import { memo } from "react";
import type { PlanGroup } from "@/lib/plan/types";
import { DropCell } from "./day-cell";
import type { HoverStore } from "./hover-store";
import { formatDayShort } from "@/lib/format/dates";

type Props = {
  group: PlanGroup;
  days: string[];
  today: string;
  collapsed: boolean;
  onToggle: (key: string) => void;
  templateDrag: boolean;
  canEdit: boolean;
  hoverStore: HoverStore;
};

export const groupKey = (g: PlanGroup) => `group:${g.id ?? "none"}`;

/** A training group's header: folds its athletes away, and takes a template on a day for the whole group. */
export const GroupRow = memo(function GroupRow({
  group,
  days,
  today,
  collapsed,
  onToggle,
  templateDrag,
  canEdit,
  hoverStore,
}: Props) {
  const count = group.athleteIds.length;
  const droppable = canEdit && group.id !== null;
  return (
    <tr
      data-testid="group-row"
      data-group-id={group.id ?? "none"}
      className="border-t-2 border-ink-200 bg-paper-sunk/70"
    >
      <th scope="rowgroup" className="sticky left-0 z-10 bg-paper-sunk px-2 py-1.5 text-left">
        <button
          type="button"
          aria-expanded={!collapsed}
          onClick={() => onToggle(groupKey(group))}
          className={clsx(
            "flex w-full items-center gap-1.5 rounded px-1 text-xs font-semibold",
            "tracking-wider text-ink-600 uppercase hover:text-ink-900",
          )}
        >
          <svg
            viewBox="0 0 12 12"
            aria-hidden
            className={clsx("h-3 w-3 fill-current transition-transform", collapsed ? "-rotate-90" : "")}
          >
            <path d="M2 4l4 4 4-4z" />
          </svg>
          {group.name}
          <span className="font-normal tracking-normal text-ink-500 normal-case">· {count}</span>
        </button>
      </th>
      {days.map((date) =>
        group.id !== null ? (
          <DropCell
            key={date}
            store={hoverStore}
            target={{ type: "group", groupId: group.id, date }}
            label={`Whole group ${group.name}, ${formatDayShort(date)}`}
            enabled={droppable}
            today={date === today}
            hint={`All ${count} athletes`}
            className="h-8"
          >
            {templateDrag && droppable ? (
              <span
                aria-hidden
                className="pointer-events-none absolute inset-1 rounded border border-dashed border-ink-200"
              />
            ) : null}
          </DropCell>
        ) : (
          <td key={date} className="border-l border-ink-100" />
        ),
      )}
    </tr>
  );
});
