"use client";

import { clsx } from "clsx";
import { memo, useMemo, useState } from "react";
import { BLOCK_KIND_LABEL } from "@/lib/format/block-summary";
import { BLOCK_KINDS, type BlockKind } from "@/lib/load/types";
import type { PlanTemplate } from "@/lib/plan/types";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { TemplateCard } from "./template-card";

/** The team's block templates: search, filter by kind, drag onto the grid, or open one in the editor. */
export const BlockShelf = memo(function BlockShelf({
  templates,
  canEdit,
  onEdit,
  onNew,
}: {
  templates: PlanTemplate[];
  canEdit: boolean;
  onEdit: (t: PlanTemplate) => void;
  onNew: () => void;
}) {
  const [query, setQuery] = useState("");
  const [kind, setKind] = useState<BlockKind | "all">("all");
  const present = useMemo(() => BLOCK_KINDS.filter((k) => templates.some((t) => t.kind === k)), [templates]);
  const shown = useMemo(() => {
    const q = query.trim().toLowerCase();
    return templates.filter(
      (t) =>
        (kind === "all" || t.kind === kind) &&
        (!q || `${t.title} ${BLOCK_KIND_LABEL[t.kind]} ${t.notes ?? ""}`.toLowerCase().includes(q)),
    );
  }, [templates, query, kind]);
  return (
    <aside
      id="block-shelf"
      tabIndex={-1}
      aria-label="Block shelf"
      data-testid="block-shelf"
      className={clsx(
        "order-first flex min-w-0 flex-col gap-3 rounded-card bg-paper-raised p-3 shadow-card outline-none",
        "ring-1 ring-ink-100 xl:sticky xl:top-4 xl:order-none xl:max-h-[calc(100dvh-2rem)]",
      )}
    >
      <div className="flex items-center justify-between">
        <h2 className="text-sm font-semibold text-ink-900">Block shelf</h2>
        {canEdit ? (
          <Button size="sm" variant="secondary" onClick={onNew} data-testid="new-template">
            New block
          </Button>
        ) : null}
      </div>
      <Input
        type="search"
        placeholder="Search blocks"
        aria-label="Search blocks"
        value={query}
        onChange={(e) => setQuery(e.target.value)}
        data-testid="shelf-search"
      />
      <div role="group" aria-label="Filter by kind" className="flex flex-wrap gap-1">
        {(["all", ...present] as const).map((k) => (
          <button
            key={k}
            type="button"
            aria-pressed={kind === k}
            data-testid={`shelf-kind-${k}`}
            onClick={() => setKind(k)}
            className={clsx(
              "rounded-full px-2 py-0.5 text-2xs font-medium ring-1 ring-inset",
              kind === k ? "bg-ink-900 text-paper ring-ink-900" : "text-ink-600 ring-ink-200 hover:bg-ink-50",
            )}
          >
            {k === "all" ? "All" : BLOCK_KIND_LABEL[k]}
          </button>
        ))}
      </div>
      {/* A row that scrolls sideways above the grid on narrower screens; a column beside it on wide ones. Positioned,
          so the cards' absolutely placed screen-reader text stays inside the scroll box instead of widening the page. */}
      <ul
        className={clsx(
          "relative -mb-1 flex gap-1.5 overflow-x-auto pb-1 xl:-mr-1 xl:mb-0 xl:flex-col",
          "xl:overflow-x-visible xl:overflow-y-auto xl:pr-1 xl:pb-0",
        )}
      >
        {shown.map((t) => (
          <TemplateCard key={t.id} template={t} canEdit={canEdit} onEdit={onEdit} />
        ))}
        {shown.length === 0 ? (
          <li className="px-1 py-4 text-center text-xs text-ink-500">
            {templates.length === 0 ? "No blocks yet. Make the first one." : "No block matches."}
          </li>
        ) : null}
      </ul>
      {canEdit ? (
        <p className="text-2xs leading-4 text-ink-500">
          Drag a block onto a day. On a group&apos;s row it goes to every athlete in the group.
        </p>
      ) : null}
    </aside>
  );
});
