import { clsx } from "clsx";
import { BLOCK_KIND_LABEL } from "@/lib/format/block-summary";
import type { BlockKind } from "@/lib/load/types";
import { KIND_STYLE } from "./kind-style";

/**
 * A block kind as a small filled tag with its code (ACC, MAX, SE…): the code tells kinds apart without colour.
 * `label` "visible" adds the kind's name beside the tag; by default the name is for screen readers only.
 */
export function KindMark({
  kind,
  label = "sr-only",
  className,
}: {
  kind: BlockKind;
  label?: "visible" | "sr-only";
  className?: string;
}) {
  const name = BLOCK_KIND_LABEL[kind];
  return (
    <span
      data-testid="kind-mark"
      data-kind={kind}
      title={name}
      className={clsx("inline-flex items-center gap-1", className)}
    >
      <span
        aria-hidden
        className={clsx("rounded-sm px-1 text-2xs leading-4 font-semibold tracking-wide", KIND_STYLE[kind].mark)}
      >
        {KIND_STYLE[kind].code}
      </span>
      <span className={label === "visible" ? "text-xs text-ink-700" : "sr-only"}>{name}</span>
    </span>
  );
}
