import { describe, expect, it } from "vitest";
import { DEFAULT_SD_TYPE, monotony, strain } from "@/lib/load/monotony";

// Foster 1998, MSSE 30:1164: monotony = daily mean ÷ SD, strain = weekly load × monotony. Check values: lib/load/README.md §9 [C].
// Which SD Foster meant is not stated [from memory]; both are pinned, population is the app default.

describe("monotony and strain", () => {
  const s2 = [500, 300, 600, 0, 400, 700, 0];

  it("defaults to the population SD", () => {
    expect(DEFAULT_SD_TYPE).toBe("population");
    expect(monotony(s2)).toBe(monotony(s2, "population"));
  });

  it("S2 population SD 255.550626: monotony 1.397542, strain 3493.856", () => {
    expect(monotony(s2, "population")).toBeCloseTo(1.397542, 6);
    expect(strain(s2, "population")).toBeCloseTo(3493.856, 3);
  });

  it("S2 sample SD 276.026224: monotony 1.293873, strain 3234.682", () => {
    expect(monotony(s2, "sample")).toBeCloseTo(1.293873, 6);
    expect(strain(s2, "sample")).toBeCloseTo(3234.682, 3);
  });

  it("S3 [600, 200, 400, 500, 100, 650, 0]: monotony 1.492405 (population), 1.381699 (sample)", () => {
    const s3 = [600, 200, 400, 500, 100, 650, 0];
    expect(monotony(s3, "population")).toBeCloseTo(1.492405, 6);
    expect(monotony(s3, "sample")).toBeCloseTo(1.381699, 6);
  });

  it("S4: identical days give SD = 0, so monotony and strain are null (never a division)", () => {
    expect(monotony([300, 300, 300, 300, 300, 300, 300])).toBeNull();
    expect(strain([300, 300, 300, 300, 300, 300, 300])).toBeNull();
    expect(monotony([0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1])).toBeNull();
    expect(monotony([0, 0, 0, 0, 0, 0, 0], "sample")).toBeNull();
  });
});
