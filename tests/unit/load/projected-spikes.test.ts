import { describe, expect, it } from "vitest";
import { projectedSpike } from "@/lib/load/projected-spikes";

// The week flag's zone rule (lib/load/README.md §7: a ratio at or above the spike line 1.5, Gabbett 2016; the
// settled days judged first) over a window of 7 days from today (§13.1). Ratios here are invented inputs.
const thisWeek = {
  weekStart: "2026-11-30",
  dailyRatio: [1.7, 1.2, 1.1, 1.0, null, 1.3, 1.4],
  dailyProvisional: [false, false, false, false, false, false, false],
};
const nextWeek = {
  weekStart: "2026-12-07",
  dailyRatio: [1.45, 1.5, 1.62, 1.9, 1.1, 1.0, 1.0],
  dailyProvisional: [false, false, false, true, false, false, false],
};

describe("projected spikes", () => {
  it("judges only the window: Monday's 1.7 is behind today, the settled 1.62 on Wednesday next week is the spike", () => {
    const spike = projectedSpike({ weeks: [nextWeek, thisWeek], from: "2026-12-02", spikeRatio: 1.5 });
    // Window Wed 2 Dec … Tue 8 Dec: 1.1, 1.0, –, 1.3, 1.4, 1.45, 1.5 → 1.5 exactly is a spike ("≥", Gabbett 2016).
    expect(spike).toEqual({ date: "2026-12-08", ratio: 1.5, provisional: false });
  });

  it("settled days first: an early 1.9 does not outrank a settled 1.62", () => {
    const spike = projectedSpike({ weeks: [thisWeek, nextWeek], from: "2026-12-07", spikeRatio: 1.5 });
    expect(spike).toEqual({ date: "2026-12-09", ratio: 1.62, provisional: false });
  });

  it("an early ratio alone is still reported, marked provisional; nothing at or above the line gives null", () => {
    const early = { ...nextWeek, dailyProvisional: nextWeek.dailyProvisional.map(() => true) };
    expect(projectedSpike({ weeks: [early], from: "2026-12-07", spikeRatio: 1.5 })).toEqual({
      date: "2026-12-10",
      ratio: 1.9,
      provisional: true,
    });
    expect(projectedSpike({ weeks: [thisWeek], from: "2026-12-01", days: 6, spikeRatio: 1.5 })).toBeNull();
    expect(projectedSpike({ weeks: [], from: "2026-12-01", spikeRatio: 1.5 })).toBeNull();
  });
});
