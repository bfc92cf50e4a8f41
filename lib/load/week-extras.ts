import { weightedContacts } from "./plyo";
import type { ContactsByIntensity, SpeedBands } from "./types";
import { dayIndex } from "@/lib/dates/plain-date";

/**
 * The week's speed bands and contacts by intensity, summed over the sessions that count in the view
 * (lib/load/README.md §11.1, §11.5).
 */
export interface WeekExtras {
  bands: SpeedBands;
  contactsByIntensity: ContactsByIntensity;
}

/** Sums sessions dated in [weekStartDay, weekStartDay + 6]; others (e.g. the recovery look-back) are skipped. */
export function weekExtras(
  sessions: readonly { date: string; bands: SpeedBands; contactsByIntensity: ContactsByIntensity }[],
  weekStartDay: number,
): WeekExtras {
  const bands: SpeedBands = { absHsrM: 0, absSprintM: 0, relHsrM: 0, relNearMaxM: 0, relMaximalM: 0 };
  let low = 0;
  let moderate = 0;
  let high = 0;
  for (const s of sessions) {
    const day = dayIndex(s.date);
    if (day < weekStartDay || day > weekStartDay + 6) continue;
    bands.absHsrM += s.bands.absHsrM;
    bands.absSprintM += s.bands.absSprintM;
    bands.relHsrM += s.bands.relHsrM;
    bands.relNearMaxM += s.bands.relNearMaxM;
    bands.relMaximalM += s.bands.relMaximalM;
    low += s.contactsByIntensity.low;
    moderate += s.contactsByIntensity.moderate;
    high += s.contactsByIntensity.high;
  }
  return {
    bands,
    contactsByIntensity: {
      low,
      moderate,
      high,
      total: low + moderate + high,
      weighted: weightedContacts(low, moderate, high),
    },
  };
}
