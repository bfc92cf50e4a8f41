import type { PlyoDrill, PlyoLevel } from "./types";

export interface ContactBand {
  min: number;
  max: number;
  /** Plain words for a coach, e.g. "some experience". */
  experience: string;
}

/**
 * Lower-body foot contacts per session by experience, off-season: Potach & Chu, NSCA Essentials of Strength
 * Training and Conditioning, 4th ed. (2016) [from memory; beginner 80–100 confirmed by a secondary page citing NSCA].
 */
export const PLYO_CONTACT_BANDS: Record<PlyoLevel, ContactBand> = {
  beginner: { min: 80, max: 100, experience: "no experience" },
  intermediate: { min: 100, max: 120, experience: "some experience" },
  advanced: { min: 120, max: 140, experience: "considerable experience" },
};

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
