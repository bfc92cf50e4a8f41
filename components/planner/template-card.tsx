"use client";

import { useDraggable } from "@dnd-kit/core";
import { clsx } from "clsx";
import { memo } from "react";
import { BLOCK_KIND_LABEL, blockSummary } from "@/lib/format/block-summary";
import { toBlockInput } from "@/lib/plan/blocks";
import type { PlanTemplate } from "@/lib/plan/types";
import { dragId, type DragData } from "./dnd";
import { KIND_STYLE } from "@/components/ui/kind-style";

function templateLabel(t: PlanTemplate) {
  return `template ${t.title}, ${BLOCK_KIND_LABEL[t.kind]}`;
}

/** A shelf entry: drag it onto a day (or a group's day); the pencil opens it in the editor. */
export const TemplateCard = memo(function TemplateCard({
  template: t,
  canEdit,
  onEdit,
  overlay = false,
}: {
  template: PlanTemplate;
  canEdit: boolean;
  onEdit: (t: PlanTemplate) => void;
  overlay?: boolean;
}) {
  const data: DragData = { source: { type: "template", templateId: t.id }, label: templateLabel(t) };
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({
    id: overlay ? `overlay:t${t.id}` : dragId(data.source),
    data,
    disabled: overlay || !canEdit,
  });
  return (
    <li
      data-testid="template-card"
      data-template-id={t.id}
      data-kind={t.kind}
      className={clsx(
        "group flex shrink-0 overflow-hidden rounded-lg bg-paper-raised ring-1 ring-ink-100",
        overlay ? "w-56 shadow-lift" : "w-52 xl:w-auto",
        isDragging && "opacity-40",
      )}
    >
      <span aria-hidden className={clsx("w-1 shrink-0", KIND_STYLE[t.kind].bar)} />
      <button
        type="button"
        ref={setNodeRef}
        {...(canEdit && !overlay ? { ...attributes, ...listeners } : {})}
        data-testid="template-drag"
        className={clsx(
          "min-w-0 flex-1 touch-manipulation px-2.5 py-2 text-left",
          canEdit ? "cursor-grab active:cursor-grabbing" : "cursor-default",
        )}
      >
        {/* Named by its visible text (WCAG 2.5.3), with "Drag template" for screen readers only. */}
        <span className="sr-only">Drag template </span>
        <span className="block text-sm leading-5 font-medium break-words text-ink-900">{t.title}</span>
        <span className="mt-0.5 block text-xs leading-4 text-ink-600">{blockSummary(toBlockInput(t))}</span>
        <span className="mt-1 flex items-center gap-1.5 text-2xs text-ink-500">
          <span className={clsx("rounded px-1 ring-1 ring-inset", KIND_STYLE[t.kind].chip)}>
            {BLOCK_KIND_LABEL[t.kind]}
          </span>
          {t.durationMin} min · RPE {t.plannedRpe}
        </span>
      </button>
      {canEdit && !overlay ? (
        <button
          type="button"
          onClick={() => onEdit(t)}
          aria-label={`Edit template ${t.title}`}
          data-testid="edit-template"
          className="px-2 text-ink-500 hover:bg-ink-50 hover:text-ink-700"
        >
          <svg viewBox="0 0 16 16" aria-hidden className="h-3.5 w-3.5 fill-current">
            <path d="M11.3 1.7a1.5 1.5 0 012.1 0l.9.9a1.5 1.5 0 010 2.1L6 13l-3.5.9.9-3.5z" />
          </svg>
        </button>
      ) : null}
    </li>
  );
});
