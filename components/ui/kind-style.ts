import type { BlockKind } from "@/lib/load/types";

/**
 * Each block kind's own colour token (tailwind.config.ts `kind.*`, used for nothing else) and a short code, so a
 * kind is told apart by its letters as well as its colour. Full class strings so Tailwind's scanner finds them.
 */
export const KIND_STYLE: Record<BlockKind, { code: string; bar: string; chip: string; mark: string }> = {
  acceleration: {
    code: "ACC",
    bar: "bg-kind-acceleration",
    chip: "bg-kind-acceleration-soft text-kind-acceleration ring-kind-acceleration/30",
    mark: "bg-kind-acceleration text-white",
  },
  max_velocity: {
    code: "MAX",
    bar: "bg-kind-max-velocity",
    chip: "bg-kind-max-velocity-soft text-kind-max-velocity ring-kind-max-velocity/30",
    mark: "bg-kind-max-velocity text-white",
  },
  speed_endurance: {
    code: "SE",
    bar: "bg-kind-speed-endurance",
    chip: "bg-kind-speed-endurance-soft text-kind-speed-endurance ring-kind-speed-endurance/30",
    mark: "bg-kind-speed-endurance text-white",
  },
  plyometric: {
    code: "PLY",
    bar: "bg-kind-plyometric",
    chip: "bg-kind-plyometric-soft text-kind-plyometric ring-kind-plyometric/30",
    mark: "bg-kind-plyometric text-white",
  },
  tempo: {
    code: "TMP",
    bar: "bg-kind-tempo",
    chip: "bg-kind-tempo-soft text-kind-tempo ring-kind-tempo/30",
    mark: "bg-kind-tempo text-white",
  },
  strength: {
    code: "STR",
    bar: "bg-kind-strength",
    chip: "bg-kind-strength-soft text-kind-strength ring-kind-strength/30",
    mark: "bg-kind-strength text-white",
  },
  recovery: {
    code: "REC",
    bar: "bg-kind-recovery",
    chip: "bg-kind-recovery-soft text-kind-recovery ring-kind-recovery/30",
    mark: "bg-kind-recovery text-white",
  },
};
