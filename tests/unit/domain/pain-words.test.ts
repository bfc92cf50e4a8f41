import { describe, expect, it } from "vitest";
import { mentionsPain } from "@/lib/domain/wellbeing";

// Which log notes reach the physio's list without a pain report: our own word list (lib/domain/wellbeing.ts).
describe("a log note that speaks of pain", () => {
  it.each([
    "Felt a twinge in the left hamstring",
    "Left calf a bit tight on the last run.",
    "Knee SORE after the bounds",
    "Achilles stiff in the warm-up",
  ])("%s", (note) => expect(mentionsPain(note)).toBe(true));

  it.each([
    "Felt quick today.",
    "Great session, PB on the flys",
    "Hamstrings curls done",
    "Tightrope walk of a day",
    "",
  ])("not: %s", (note) => expect(mentionsPain(note)).toBe(false));
});
