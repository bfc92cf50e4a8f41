import type { BlockKind } from "@/lib/load/types";

// Kind colours are the product's own and deliberately separate from the flag colours (flags mean "look").
// Full class strings so Tailwind's scanner finds them.
export const KIND_STYLE: Record<BlockKind, { bar: string; chip: string }> = {
  acceleration: { bar: "bg-clay-400", chip: "bg-clay-50 text-clay-700 ring-clay-200" },
  max_velocity: { bar: "bg-clay-600", chip: "bg-clay-100 text-clay-800 ring-clay-300" },
  speed_endurance: { bar: "bg-clay-800", chip: "bg-clay-50 text-clay-900 ring-clay-300" },
  plyometric: { bar: "bg-lane-500", chip: "bg-lane-50 text-lane-800 ring-lane-200" },
  tempo: { bar: "bg-lane-300", chip: "bg-lane-50 text-lane-700 ring-lane-200" },
  strength: { bar: "bg-ink-500", chip: "bg-ink-50 text-ink-700 ring-ink-200" },
  recovery: { bar: "bg-ink-200", chip: "bg-paper-sunk text-ink-600 ring-ink-100" },
};
