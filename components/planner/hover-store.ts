"use client";

import { useState, useSyncExternalStore } from "react";
import type { DragSource, DropTarget } from "@/lib/plan/drop";
import type { RowPreview } from "@/lib/plan/preview";
import type { RestrictionHit } from "@/lib/restrictions/rules";

/** What the item being dragged would do to the cell under it. */
export type Hover = {
  source: DragSource;
  target: DropTarget;
  rows: Map<number, RowPreview>;
  refusal: string | null;
  text: string;
  hits: RestrictionHit[];
};

/**
 * The drag preview lives outside React state on purpose: a new cell under the pointer re-renders only what
 * shows the preview (the panel and the one or two rows whose numbers change), never the whole planner.
 */
export class HoverStore {
  private hover: Hover | null = null;
  private listeners = new Set<() => void>();
  get = (): Hover | null => this.hover;

  set = (hover: Hover | null): void => {
    if (hover === this.hover) return;
    this.hover = hover;
    for (const l of this.listeners) l();
  };

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

const none = () => null;

export function useHoverStore(): HoverStore {
  const [store] = useState(() => new HoverStore());
  return store;
}

export function useHover(store: HoverStore): Hover | null {
  return useSyncExternalStore(store.subscribe, store.get, none);
}

/** One row's preview; the same object while the pointer stays over cells that leave this row alone. */
export function useRowPreview(store: HoverStore, athleteId: number): RowPreview | null {
  return useSyncExternalStore(store.subscribe, () => store.get()?.rows.get(athleteId) ?? null, none);
}
