import type { PlyoDrill, PlyoLevel } from "./types";

export interface ContactBand {
  min: number;
  max: number;
  /** Plain words for a coach, e.g. "some experience". */
  experience: string;
}

/**
 * Lower-body foot contacts per session by experience. These are the NSCA's OFF-SEASON session ranges (preseason
 * and in-season volumes differ; Chu 1998 gives higher preseason ranges): Potach & Chu, NSCA Essentials of Strength
 * Training and Conditioning, 4th ed. (2016) [from memory; beginner 80–100 confirmed by a secondary page citing NSCA].
 */
export const PLYO_CONTACT_BANDS: Record<PlyoLevel, ContactBand> = {
  beginner: { min: 80, max: 100, experience: "no experience" },
  intermediate: { min: 100, max: 120, experience: "some experience" },
  advanced: { min: 120, max: 140, experience: "considerable experience" },
};

/**
 * Weight of one contact by drill intensity, for the intensity-weighted dose: low 1, moderate 2, high 3. The
 * NSCA guidance grades drills low to high and has volume fall as intensity rises (Potach & Chu, NSCA
 * Essentials, 4th ed.) [from memory]; it gives no weights, so these are a design choice (common practice of
 * counting a depth jump as worth several pogo contacts), stated on the explanation page.
 */
export const PLYO_INTENSITY_WEIGHT = { low: 1, moderate: 2, high: 3 } as const;

export function weightedContacts(low: number, moderate: number, high: number): number {
  return (
    low * PLYO_INTENSITY_WEIGHT.low + moderate * PLYO_INTENSITY_WEIGHT.moderate + high * PLYO_INTENSITY_WEIGHT.high
  );
}

export function contactBand(level: PlyoLevel): ContactBand {
  return PLYO_CONTACT_BANDS[level] ?? PLYO_CONTACT_BANDS.beginner;
}

/** Contacts of a drill list: sets × reps × contacts per rep (one per landing of one foot or both feet, NSCA). */
export function drillContacts(drills: readonly PlyoDrill[]): number {
  let total = 0;
  for (const d of drills) total += d.sets * d.reps * d.contactsPerRep;
  return total;
}

/** A session is over the band when its contacts exceed the band's upper bound (the bound itself passes). */
export function aboveContactBand(contacts: number, level: PlyoLevel): boolean {
  return contacts > contactBand(level).max;
}
