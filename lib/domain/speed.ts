// Value sets of the speed lab (lib/speed/README.md).

/** What a speed test holds: timing gates, a speed trace, contact measurements or a vertical force trace. */
export type SpeedTestKind = "timing" | "trace" | "contacts" | "force";

/** How a timing trial started. */
export const SPEED_START_TYPES = ["blocks", "crouch", "standing", "flying"] as const;
export type SpeedStartType = (typeof SPEED_START_TYPES)[number];
