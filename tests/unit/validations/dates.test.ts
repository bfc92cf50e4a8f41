import { describe, expect, it } from "vitest";
import { athleteSchema } from "@/lib/validations/athlete";
import { localDateSchema } from "@/lib/validations/dates";

describe("date bounds", () => {
  it("plan dates run from 1900-01-01 to 2100-12-31", () => {
    for (const ok of ["1900-01-01", "2026-03-02", "2100-12-31", "2096-02-29"])
      expect(localDateSchema.safeParse(ok).success, ok).toBe(true);
    for (const bad of [
      "1899-12-31",
      "2101-01-01",
      "9999-12-31",
      "0000-01-01",
      "2100-02-29",
      "2026-3-2",
      "+02026-03-02",
    ])
      expect(localDateSchema.safeParse(bad).success, bad).toBe(false);
  });

  it("a birth date or a test date cannot be in the future or before 1900, and names its field", () => {
    const base = { name: "Ada", plyoLevel: "beginner" };
    const nextYear = `${new Date().getUTCFullYear() + 1}-06-01`;
    for (const [field, value] of [
      ["birthDate", nextYear],
      ["birthDate", "1899-12-31"],
      ["vmaxTestedOn", "9999-12-31"],
      ["vmaxTestedOn", nextYear],
    ]) {
      const parsed = athleteSchema.safeParse({ ...base, [field]: value });
      expect(parsed.success, `${field} ${value}`).toBe(false);
      expect(parsed.error?.issues.map((i) => i.path.join("."))).toEqual([field]);
    }
    expect(
      athleteSchema.safeParse({ ...base, birthDate: "2004-05-06", vmaxTestedOn: new Date().toISOString().slice(0, 10) })
        .success,
    ).toBe(true);
  });
});
