import { describe, expect, it } from "vitest";
import { retestStatus, vmaxChange } from "@/lib/speed/retest";

// Due a re-test and vmax drops (lib/speed/README.md §6): our rules, pinned at their boundaries.
describe("due a re-test", () => {
  it("never tested: due; tested N weeks ago to the day: due; a day less: not due", () => {
    expect(retestStatus({ lastTimingTest: null, today: "2026-12-02" })).toEqual({ daysSince: null, due: true });
    expect(retestStatus({ lastTimingTest: "2026-10-21", today: "2026-12-02", retestWeeks: 6 })).toEqual({
      daysSince: 42,
      due: true,
    });
    expect(retestStatus({ lastTimingTest: "2026-10-22", today: "2026-12-02", retestWeeks: 6 })).toEqual({
      daysSince: 41,
      due: false,
    });
    expect(retestStatus({ lastTimingTest: "2026-11-25", today: "2026-12-02", retestWeeks: 1 }).due).toBe(true);
  });
});

describe("vmax change since the last test", () => {
  it("compares the newest test with the one before; a drop beyond 0.1 m/s counts", () => {
    expect(vmaxChange([9.5])).toEqual({ change: null, dropped: false });
    expect(vmaxChange([9.3, 9.5]).dropped).toBe(true);
    expect(vmaxChange([9.45, 9.5]).dropped).toBe(false);
    expect(vmaxChange([9.7, 9.5])).toMatchObject({ dropped: false });
    expect(vmaxChange([9.7, 9.5]).change).toBeCloseTo(0.2, 12);
  });
});
