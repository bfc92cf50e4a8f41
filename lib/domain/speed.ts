// Value sets of the speed lab (lib/speed/README.md).

/** What a speed test holds: timing gates, a speed trace, contact measurements or a vertical force trace. */
export const SPEED_TEST_KINDS = ["timing", "trace", "contacts", "force"] as const;
export type SpeedTestKind = (typeof SPEED_TEST_KINDS)[number];

/** How a timing trial started. */
export const SPEED_START_TYPES = ["blocks", "crouch", "standing", "flying"] as const;
export type SpeedStartType = (typeof SPEED_START_TYPES)[number];
