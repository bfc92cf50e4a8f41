"use client";

import { clsx } from "clsx";
import { useSyncExternalStore, type ReactNode } from "react";
import type { DropTarget } from "@/lib/plan/drop";
import { dropId } from "./dnd";
import type { HoverStore } from "./hover-store";

const never = () => false;

/** Whether the dragged item points at this cell; only the cells that flip re-render. */
function useIsOver(store: HoverStore, target: DropTarget): boolean {
  const id = dropId(target);
  return useSyncExternalStore(
    store.subscribe,
    () => {
      const t = store.get()?.target;
      return t !== undefined && dropId(t) === id;
    },
    never,
  );
}

/** One day of a row: one athlete's day, or a group's day (templates only). `enabled`: items can be dropped here. */
export function DropCell({
  store,
  target,
  label,
  enabled,
  today,
  hint,
  children,
  className,
  as: Tag = "td",
}: {
  store: HoverStore;
  target: DropTarget;
  label: string;
  enabled: boolean;
  today: boolean;
  hint?: string;
  children?: ReactNode;
  className?: string;
  /** A table cell in the grid; a list item in the phone's stacked week. */
  as?: "td" | "li";
}) {
  const isOver = useIsOver(store, target);
  return (
    <Tag
      data-testid={target.type === "cell" ? "day-cell" : "group-cell"}
      data-athlete-id={target.type === "cell" ? target.athleteId : undefined}
      data-group-id={target.type === "group" ? target.groupId : undefined}
      data-date={target.date}
      data-drop={enabled ? "on" : undefined}
      data-over={isOver || undefined}
      aria-label={label}
      className={clsx(
        "relative align-top transition-colors",
        Tag === "td" ? "border-l border-ink-100" : "rounded-lg bg-paper-raised ring-1 ring-ink-100",
        today && "bg-clay-50/40",
        "group-data-[dragging=true]/grid:bg-ink-50/40",
        isOver && "!bg-lane-50 outline-2 -outline-offset-2 outline-lane-400 outline-dashed",
        className,
      )}
    >
      {children}
      {isOver && hint ? (
        <span
          className={clsx(
            "pointer-events-none absolute inset-x-1 bottom-1 rounded bg-lane-600",
            "px-1 py-0.5 text-center text-2xs font-medium text-white",
          )}
        >
          {hint}
        </span>
      ) : null}
    </Tag>
  );
}
