import { describe, expect, it } from "vitest";
import { logLockState } from "@/lib/plan/log-lock";

const end = new Date("2026-11-02T08:15:00Z");
const hours = (h: number) => new Date(end.getTime() + h * 3_600_000);

describe("the 48-hour log lock", () => {
  it("stays open until 48 hours after the session ends, then locks", () => {
    expect(logLockState({ sessionEndsAt: end, unlockedAt: null, now: hours(47.99) })).toEqual({
      locked: false,
      locksAt: hours(48),
    });
    expect(logLockState({ sessionEndsAt: end, unlockedAt: null, now: hours(48) }).locked).toBe(true);
  });

  it("a coach reopening it gives another 48 hours from that moment, never less than the session's own", () => {
    expect(logLockState({ sessionEndsAt: end, unlockedAt: hours(100), now: hours(120) })).toEqual({
      locked: false,
      locksAt: hours(148),
    });
    expect(logLockState({ sessionEndsAt: end, unlockedAt: hours(100), now: hours(148) }).locked).toBe(true);
    expect(logLockState({ sessionEndsAt: end, unlockedAt: hours(-10), now: hours(40) }).locksAt).toEqual(hours(48));
  });
});
