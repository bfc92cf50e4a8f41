"use client";

import { useDraggable } from "@dnd-kit/core";
import { clsx } from "clsx";
import { memo } from "react";
import type { Flag } from "@/lib/load/flags";
import { BLOCK_KIND_LABEL, blockSummary, mainBlockKind } from "@/lib/format/block-summary";
import { formatDayShort } from "@/lib/format/dates";
import { toBlockInput } from "@/lib/plan/blocks";
import type { PlanSession } from "@/lib/plan/types";
import { CardMenu } from "./card-menu";
import { dragId, type DragData } from "./dnd";
import { FlagMark } from "@/components/ui/flag-mark";
import { KindMark } from "@/components/ui/kind-mark";

const STATUS_WORD = { draft: "Draft", published: "Published", cancelled: "Cancelled" } as const;

function sessionLabel(s: PlanSession, athleteName: string): string {
  const kind = mainBlockKind(s.blocks);
  const what = kind ? `${s.title}, ${BLOCK_KIND_LABEL[kind]}` : s.title;
  return `${what} for ${athleteName}, ${formatDayShort(s.date)} ${s.startTime}, ${STATUS_WORD[s.status].toLowerCase()}`;
}

/** What a card's visible text leaves to the eye: whose it is, which day (each block's kind is in its KindMark). */
function contextOf(s: PlanSession, athleteName: string): string {
  return `for ${athleteName || "the athlete"}, ${formatDayShort(s.date)}`;
}

/** Published: a filled dot; draft: a hollow one (the card is also hatched); cancelled: a cross. */
function StatusMark({ status }: { status: PlanSession["status"] }) {
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
      data-restricted={restricted ? "true" : undefined}
      className={clsx(
        "group relative flex flex-col overflow-hidden rounded-md bg-paper-raised text-left shadow-card transition-opacity",
        // A conflict with a physio restriction is a thick dashed border and a label, never colour alone.
        restricted ? "border-2 border-dashed border-limit" : "ring-1",
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
      {restricted ? (
        <span
          data-testid="card-restricted"
          title={restricted}
          className="flex items-center gap-1 bg-limit-soft px-1.5 py-0.5 text-2xs font-semibold text-limit"
        >
          <span aria-hidden>⚕</span> Past a physio limit
          <span className="sr-only">: {restricted}</span>
        </span>
      ) : null}
      {/* The name is the visible text plus the context a screen reader needs (athlete, day, state), so the
          accessible name contains what sighted users read (WCAG 2.5.3). */}
      <button
        type="button"
        ref={setNodeRef}
        {...dragProps}
        onClick={() => !overlay && actions.open(s)}
        data-testid="card-open"
        className={clsx(
          "flex min-w-0 flex-1 touch-manipulation text-left",
          canEdit && !cancelled ? "cursor-grab active:cursor-grabbing" : "cursor-pointer",
        )}
      >
        <CardBody session={s} />
        <span className="sr-only">, {contextOf(s, athleteName)}</span>
      </button>
      {flags.length > 0 ? <CardFlags flags={flags} /> : null}
      {canEdit && !overlay && !pending ? <CardActionsMenu session={s} label={label} actions={actions} /> : null}
    </div>
  );
});

/**
 * The whole prescription, every block, wrapped (never clipped), in ink dark enough for the track (≥ 4.5:1); each
 * block starts with its kind's code tag (KindMark), so kinds differ by letters as well as colour.
 */
const CardBody = memo(function CardBody({ session: s }: { session: PlanSession }) {
  return (
    <>
      <span className="block min-w-0 flex-1 px-1.5 py-1">
        <span className="flex items-center gap-1 text-2xs text-ink-700">
          <span className="tabular-nums">{s.startTime}</span>
          <StatusMark status={s.status} />
        </span>
        <span
          className={clsx(
            "block text-xs leading-4 font-medium break-words text-ink-900",
            s.status === "cancelled" && "line-through",
          )}
        >
          {s.title}
        </span>
        {s.blocks.map((b) => (
          <span key={b.id} data-testid="card-block" className="mt-0.5 block text-xs leading-4 break-words text-ink-700">
            <KindMark kind={b.kind} className="mr-1 align-top" /> {blockSummary(toBlockInput(b))}
          </span>
        ))}
      </span>
    </>
  );
});

const CardFlags = memo(function CardFlags({ flags }: { flags: Flag[] }) {
  return (
    <span className="flex flex-wrap justify-end gap-1 px-1.5 pb-1">
      {flags.map((f) => (
        // The flag's own shape and colour (FlagMark); the label and reason are read out and shown on hover.
        <span key={`${f.kind}${f.date}`} data-testid="card-flag" data-kind={f.kind}>
          <FlagMark kind={f.kind} label="sr-only" detail={f.reason} className="[&>svg]:h-3 [&>svg]:w-3" />
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
