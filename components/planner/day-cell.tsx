"use client";

import { useDroppable } from "@dnd-kit/core";
import { clsx } from "clsx";
import type { ReactNode } from "react";
import type { DropTarget } from "@/lib/plan/drop";
import { dropId, type DropData } from "./dnd";

/** A drop zone in the grid: one athlete's day, or a group's day (templates only). */
export function DropCell({ target, label, enabled, today, hint, children, className }: { target: DropTarget; label: string; enabled: boolean; today: boolean; hint?: string; children?: ReactNode; className?: string }) {
  const data: DropData = { target, label };
  const { setNodeRef, isOver, active } = useDroppable({ id: dropId(target), data, disabled: !enabled });
  const dragging = enabled && active !== null;
  return (
    <td
      ref={setNodeRef}
      data-testid={target.type === "cell" ? "day-cell" : "group-cell"}
      data-athlete-id={target.type === "cell" ? target.athleteId : undefined}
      data-group-id={target.type === "group" ? target.groupId : undefined}
      data-date={target.date}
      data-over={isOver || undefined}
      aria-label={label}
      className={clsx(
        "relative border-l border-ink-100 align-top transition-colors",
        today && "bg-clay-50/40",
        dragging && "bg-ink-50/40",
        isOver && "!bg-lane-50 outline-2 -outline-offset-2 outline-lane-400 outline-dashed",
        className,
      )}
    >
      {children}
      {isOver && hint ? <span className="pointer-events-none absolute inset-x-1 bottom-1 rounded bg-lane-600 px-1 py-0.5 text-center text-2xs font-medium text-white">{hint}</span> : null}
    </td>
  );
}
