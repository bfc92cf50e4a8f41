import { describe, expect, it } from "vitest";
import { computeFlags, type FlagSession } from "@/lib/load/flags";
import { aboveContactBand, contactBand, drillContacts } from "@/lib/load/plyo";
import { emptyMetricColumns } from "@/lib/load/series";
import { SETTINGS, drill } from "./fixtures";

// NSCA contact ranges per session: Potach & Chu, Essentials of Strength Training and Conditioning, 4th ed. (2016)
// [from memory; beginner 80–100 confirmed by a secondary page citing NSCA]. Check values: lib/load/README.md §2 [C].

describe("NSCA contact bands", () => {
  it("beginner 80–100, intermediate 100–120, advanced 120–140 [from memory]", () => {
    expect(contactBand("beginner")).toMatchObject({ min: 80, max: 100 });
    expect(contactBand("intermediate")).toMatchObject({ min: 100, max: 120 });
    expect(contactBand("advanced")).toMatchObject({ min: 120, max: 140 });
  });

  it("P1: 68 contacts is below the beginner band", () => {
    const p1 = drillContacts([drill(2, 10, 1, "low"), drill(3, 8, 1, "moderate"), drill(4, 6, 1, "high")]);
    expect(p1).toBe(68);
    expect(p1 < contactBand("beginner").min).toBe(true);
    expect(aboveContactBand(p1, "beginner")).toBe(false);
  });

  it("P2: 110 contacts is inside the intermediate band and above the beginner maximum", () => {
    const p2 = drillContacts([drill(3, 10, 1, "moderate"), drill(4, 10, 1, "low"), drill(5, 8, 1, "high")]);
    expect(p2).toBe(110);
    expect(aboveContactBand(p2, "intermediate")).toBe(false);
    expect(aboveContactBand(p2, "beginner")).toBe(true);
  });

  it("P3: 10 single-leg hops per leg = 20 contacts; the band's top itself passes", () => {
    expect(drillContacts([drill(2, 10, 1, "moderate", "single-leg hop, one set per leg")])).toBe(20);
    expect(aboveContactBand(120, "intermediate")).toBe(false);
    expect(aboveContactBand(121, "intermediate")).toBe(true);
  });
});

describe("P4 recovery window: 48 h between high-intensity sessions, inclusive (NSCA 48–72 h [from memory])", () => {
  const hard = (id: string, date: string, startTime: string): FlagSession => ({
    id,
    date,
    startTime,
    contactsByIntensity: { total: 40 },
    highIntensity: true,
  });
  const recoveryFlags = (sessions: FlagSession[]) =>
    computeFlags({
      firstDate: "2026-03-09",
      values: emptyMetricColumns(7),
      ratio: new Float64Array(7).fill(Number.NaN),
      provisional: new Uint8Array(7),
      sessions,
      profile: { plyoLevel: "advanced" },
      settings: SETTINGS,
      weekStart: "2026-03-09",
    }).filter((f) => f.kind === "recovery");

  it("Mon 09:00 → Wed 09:00 = 48 h passes", () => {
    expect(recoveryFlags([hard("a", "2026-03-09", "09:00"), hard("b", "2026-03-11", "09:00")])).toEqual([]);
  });

  it("Mon 09:00 → Wed 08:00 = 47 h fails", () => {
    const flags = recoveryFlags([hard("a", "2026-03-09", "09:00"), hard("b", "2026-03-11", "08:00")]);
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({ sessionId: "b", date: "2026-03-11", value: 47, threshold: 48, level: "caution" });
    expect(flags[0].reason).toBe(
      "High-intensity sessions on Mon 9 Mar 09:00 and Wed 11 Mar 08:00 are 47 h apart, less than the 48 h recovery window.",
    );
  });

  it("Mon 17:00 → Tue 17:00 = 24 h fails", () => {
    const flags = recoveryFlags([hard("b", "2026-03-10", "17:00"), hard("a", "2026-03-09", "17:00")]);
    expect(flags.map((f) => f.value)).toEqual([24]);
  });

  it("sessions that are not high-intensity never trigger it", () => {
    const easy = { ...hard("b", "2026-03-10", "09:00"), highIntensity: false };
    expect(recoveryFlags([hard("a", "2026-03-09", "09:00"), easy])).toEqual([]);
  });

  it("a pair that straddles the week start is reported in the later session's week only", () => {
    const sunday = hard("sun", "2026-03-08", "18:00");
    const monday = hard("mon", "2026-03-09", "09:00");
    expect(recoveryFlags([sunday, monday]).map((f) => f.sessionId)).toEqual(["mon"]);
  });
});
