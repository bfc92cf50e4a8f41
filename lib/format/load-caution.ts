/** Shown next to every load flag (UI and e-mail): flags support people, they do not decide for them. */
export const LOAD_FLAG_CAUTION =
  "Load flags are monitoring aids, not diagnoses. Decide with the athlete's medical staff and follow local rules.";
