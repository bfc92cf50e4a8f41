"use client";

import { useDraggable } from "@dnd-kit/core";
import { clsx } from "clsx";
import { memo } from "react";
import type { Flag } from "@/lib/load/flags";
import { FLAG_DISPLAY, flagClasses } from "@/lib/load/flag-display";
import { BLOCK_KIND_LABEL, blockSummary, mainBlockKind } from "@/lib/format/block-summary";
import { formatDayShort } from "@/lib/format/dates";
import { toBlockInput } from "@/lib/plan/blocks";
import type { PlanSession } from "@/lib/plan/types";
import { CardMenu } from "./card-menu";
import { dragId, type DragData } from "./dnd";
import { KIND_STYLE } from "@/components/ui/kind-style";

const STATUS_WORD = { draft: "Draft", published: "Published", cancelled: "Cancelled" } as const;

export function sessionLabel(s: PlanSession, athleteName: string): string {
  const kind = mainBlockKind(s.blocks);
  const what = kind ? `${s.title}, ${BLOCK_KIND_LABEL[kind]}` : s.title;
  return `${what} for ${athleteName}, ${formatDayShort(s.date)} ${s.startTime}, ${STATUS_WORD[s.status].toLowerCase()}`;
}

/** Published: a filled dot; draft: a hollow one (the card is also hatched); cancelled: a cross. */
export function StatusMark({ status }: { status: PlanSession["status"] }) {
  return (
    <span className="inline-flex items-center" title={STATUS_WORD[status]}>
      {status === "published" ? <span aria-hidden className="h-1.5 w-1.5 rounded-full bg-state-published" /> : null}
      {status === "draft" ? (
        <span aria-hidden className="h-1.5 w-1.5 rounded-full ring-1 ring-state-draft ring-inset" />
      ) : null}
      {status === "cancelled" ? (
        <span aria-hidden className="text-2xs font-semibold text-flag-spike">
          ✕
        </span>
      ) : null}
      <span className="sr-only">{STATUS_WORD[status]}</span>
    </span>
  );
}

export type CardActions = {
  open: (s: PlanSession) => void;
  armCopy: (s: PlanSession) => void;
  remove: (s: PlanSession) => void | Promise<void>;
};

type Props = {
  session: PlanSession;
  athleteName: string;
  canEdit: boolean;
  copyArmed: boolean;
  flags: Flag[];
  actions: CardActions;
  overlay?: boolean;
  /** The physio restrictions this session goes past, in words (it was let through with a reason, or predates them). */
  restricted?: string | null;
};

/** One session in a day cell: kind stripe, time and state, title, the first block's key numbers. */
export const SessionCard = memo(function SessionCard({
  session: s,
  athleteName,
  canEdit,
  copyArmed,
  flags,
  actions,
  overlay = false,
  restricted = null,
}: Props) {
  const label = sessionLabel(s, athleteName);
  const pending = s.id < 0;
  const cancelled = s.status === "cancelled";
  const data: DragData = { source: { type: "session", sessionId: s.id }, label };
  // The drag hook re-renders on every move over the grid; everything below it is memoised on the session.
  const draggable = !overlay && canEdit && !pending && !cancelled;
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({
    id: overlay ? `overlay:${s.id}` : dragId(data.source),
    data,
    disabled: !draggable,
  });
  // Only a card that can move says so; the others are plain buttons that open the session.
  const dragProps = draggable ? { ...attributes, ...listeners } : {};
  return (
    <div
      data-testid="session-card"
      data-session-id={s.id}
      data-status={s.status}
      data-pending={pending || undefined}
      className={clsx(
        "group relative flex overflow-hidden rounded-md bg-paper-raised text-left shadow-card ring-1 transition-opacity",
        s.status === "draft"
          ? "[background-image:repeating-linear-gradient(135deg,transparent_0_6px,rgba(154,169,189,0.08)_6px_12px)] ring-ink-200"
          : "ring-ink-100",
        cancelled && "opacity-55",
        isDragging && "opacity-30",
        pending && "animate-pulse",
        copyArmed && "ring-2 ring-lane-500",
        overlay && "w-40 rotate-1 shadow-lift",
      )}
    >
      <button
        type="button"
        ref={setNodeRef}
        {...dragProps}
        aria-label={label}
        onClick={() => !overlay && actions.open(s)}
        className={clsx(
          "flex min-w-0 flex-1 text-left",
          canEdit && !cancelled ? "cursor-grab active:cursor-grabbing" : "cursor-pointer",
        )}
      >
        <CardBody session={s} />
      </button>
      {flags.length > 0 ? <CardFlags flags={flags} /> : null}
      {restricted ? (
        <span
          data-testid="card-restricted"
          title={restricted}
          className="absolute top-0.5 left-1.5 text-2xs font-semibold text-flag-climb"
        >
          <span aria-hidden>⚕</span>
          <span className="sr-only">Goes past a physio restriction: {restricted}</span>
        </span>
      ) : null}
      {canEdit && !overlay && !pending ? <CardActionsMenu session={s} label={label} actions={actions} /> : null}
    </div>
  );
});

const CardBody = memo(function CardBody({ session: s }: { session: PlanSession }) {
  const kind = mainBlockKind(s.blocks);
  const first = s.blocks[0];
  const more = s.blocks.length - 1;
  return (
    <>
      <span aria-hidden className={clsx("w-1 shrink-0", kind ? KIND_STYLE[kind].bar : "bg-ink-100")} />
      <span className="block min-w-0 flex-1 px-1.5 py-1">
        <span className="flex items-center gap-1 text-2xs text-ink-500">
          <span className="tabular-nums">{s.startTime}</span>
          <StatusMark status={s.status} />
        </span>
        <span
          className={clsx(
            "line-clamp-2 text-xs leading-4 font-medium break-words hyphens-auto text-ink-900",
            s.status === "cancelled" && "line-through",
          )}
        >
          {s.title}
        </span>
        {first ? (
          <span className="mt-0.5 line-clamp-2 text-2xs leading-[0.95rem] text-ink-600">
            {blockSummary(toBlockInput(first))}
          </span>
        ) : null}
        {more > 0 ? <span className="text-2xs text-ink-400">+{more} more</span> : null}
      </span>
    </>
  );
});

const CardFlags = memo(function CardFlags({ flags }: { flags: Flag[] }) {
  return (
    <span className="absolute right-1 bottom-1 flex gap-0.5">
      {flags.map((f) => (
        <span
          key={`${f.kind}${f.date}`}
          title={f.reason}
          data-testid="card-flag"
          data-kind={f.kind}
          className={clsx("h-2 w-2 rounded-full", flagClasses(f.kind).dot)}
        >
          <span className="sr-only">
            {FLAG_DISPLAY[f.kind].label}: {f.reason}
          </span>
        </span>
      ))}
    </span>
  );
});

const CardActionsMenu = memo(function CardActionsMenu({
  session: s,
  label,
  actions,
}: {
  session: PlanSession;
  label: string;
  actions: CardActions;
}) {
  const cancelled = s.status === "cancelled";
  return (
    <div className="absolute top-0.5 right-0.5 opacity-0 group-hover:opacity-100 focus-within:opacity-100">
      <CardMenu
        label={`More for ${label}`}
        items={[
          { label: "Edit", onSelect: () => actions.open(s), testId: "menu-edit" },
          ...(cancelled
            ? []
            : [{ label: "Copy to another day…", onSelect: () => actions.armCopy(s), testId: "menu-copy" }]),
          ...(cancelled
            ? []
            : [
                {
                  label: s.status === "published" ? "Cancel session" : "Delete",
                  onSelect: () => void actions.remove(s),
                  danger: true,
                  testId: "menu-delete",
                },
              ]),
        ]}
      />
    </div>
  );
});
