"use client";

import { useLayoutEffect, useState } from "react";

/**
 * A box holding the latest value for code that runs outside React's render: dnd-kit's sensors, announcements
 * and drag handlers, window key listeners. Read it in those callbacks, never to render.
 */
export class Latest<T> {
  constructor(private value: T) {}
  get(): T {
    return this.value;
  }
  set(value: T): void {
    this.value = value;
  }
}

/** A Latest box kept equal to `value` after every commit. */
export function useLatest<T>(value: T): Latest<T> {
  const [box] = useState(() => new Latest(value));
  useLayoutEffect(() => box.set(value));
  return box;
}

/** A Latest box the callbacks themselves write (drag state, counters, caches). */
export function useBox<T>(initial: T): Latest<T> {
  const [box] = useState(() => new Latest(initial));
  return box;
}
