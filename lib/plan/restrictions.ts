import type { PlanChange } from "./drop";

/**
 * Seam for physio restrictions (e.g. "no max-velocity work until a date", "contact cap"). The physio feature
 * does not exist yet, so every athlete has none and no drop asks for an override. When it lands, the grid
 * calls these before saving a drop and asks for a reason when `restrictionsHit` is not empty.
 */
export type Restriction = { id: number; athleteId: number; summary: string };

export function restrictionsFor(athleteId: number): Restriction[] {
  void athleteId;
  return [];
}

export function restrictionsHit(change: PlanChange): Restriction[] {
  void change;
  return [];
}
