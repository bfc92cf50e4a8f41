// Value sets of an athlete's profile.

export const SEXES = ["female", "male"] as const;
export type Sex = (typeof SEXES)[number];

/** Plyometric experience, which sets the ground-contact guidance per session. */
export const PLYO_LEVELS = ["beginner", "intermediate", "advanced"] as const;
export type PlyoLevel = (typeof PLYO_LEVELS)[number];
