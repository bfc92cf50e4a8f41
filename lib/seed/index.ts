import type { Db } from "@/models";
import { seedClub, type SeededClub } from "./seed-club";
import { seedLoad } from "./seed-load";
import { seedMedical } from "./seed-medical";
import { seedRestrictions } from "./seed-restrictions";
import { seedNotices } from "@/lib/notices/seed";

export type SeedOptions = {
  /** The local date the demo's "today" falls on (YYYY-MM-DD); defaults to the real date. */
  today?: string;
};

/**
 * Seeds the whole demo: the club, then each feature's invented content. Feature seeders register here
 * in order; each receives the club it builds on.
 */
export async function seedDemo(d: Db, options: SeedOptions = {}): Promise<SeededClub> {
  const club = await seedClub(d);
  await seedLoad(d, club, options);
  await seedNotices(d, club);
  await seedRestrictions(d, club, options);
  await seedMedical(d, club, options);
  void options;
  return club;
}
