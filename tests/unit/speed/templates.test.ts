import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DEFAULT_TEAM_LOAD_SETTINGS } from "@/lib/load/types";
import { analyseContactRows, analyseForceTrace } from "@/lib/speed/contact-analysis";
import { G } from "@/lib/speed/force-trace";
import { parseMeasureCsv, type MeasureKind } from "@/lib/speed/measure-csv";
import { analyseSpeedTrace } from "@/lib/speed/speed-trace";

// The downloadable templates of the speed trace, force trace and contact layouts (lib/speed/README.md §9) must
// read cleanly and give the answers they were made from.
const read = (kind: MeasureKind) => {
  const text = readFileSync(join(__dirname, `../../../public/speed-${kind}-template.csv`), "utf8");
  const r = parseMeasureCsv(kind, text);
  if (!r.ok) throw new Error(`${kind} template refused: ${r.file ?? JSON.stringify(r.problems.slice(0, 3))}`);
  return r.columns as Record<string, number[]>;
};

describe("measurement templates", () => {
  it("speed trace: 20 Hz, 1 s standing then the T4 sprint (vmax 9.5 m/s, τ 1.1 s, lib/speed/README.md §1)", () => {
    const c = read("trace");
    const a = analyseSpeedTrace({ t: c.time_s, v: c.speed_ms }, 9.5, DEFAULT_TEAM_LOAD_SETTINGS);
    expect(a.samplingHz).toBeCloseTo(20, 9);
    // Speeds are printed to 1 mm/s, so the fit is close but not exact.
    expect(Math.abs(a.fit!.tau - 1.1)).toBeLessThan(0.01);
    expect(Math.abs(a.fit!.vmax - 9.5)).toBeLessThan(0.01);
    expect(Math.abs(a.fit!.startS - 1)).toBeLessThan(0.02);
  });

  it("force trace: 1000 Hz, three half-sine contacts of 0.10 s every 0.22 s at 2.2 BW mean for 75 kg (§7, B2)", () => {
    const c = read("force");
    const a = analyseForceTrace({ t: c.time_s, f: c.force_n }, 75);
    expect(a.mode).toBe("contacts");
    expect(a.contacts).toHaveLength(3);
    // Half-sine impulse 2·P·t/π with P = π/2 × 2.2 × m·g, so the impulse is 2.2·m·g·t (README §7 check values).
    expect(a.means.impulseNs!).toBeCloseTo(2.2 * 75 * G * 0.1, -1);
    expect(a.means.contactTimeS!).toBeGreaterThan(0.095);
    expect(a.means.contactTimeS!).toBeLessThan(0.1);
    expect(a.means.stepFrequencyHz!).toBeCloseTo(1 / 0.22, 1);
  });

  it("contact rows: near B1 (0.086 s contact, 0.145 s flight): about 4.33 Hz and 2.67 BW; step length optional", () => {
    const c = read("contacts");
    const rows = c.contact_time_s.map((contactTimeS, i) => ({
      contactTimeS,
      flightTimeS: c.flight_time_s[i],
      stepLengthM: c.step_length_m[i],
    }));
    const a = analyseContactRows(rows)!;
    expect(rows).toHaveLength(4);
    expect(rows[3].stepLengthM).toBeNull();
    expect(a.means.stepFrequencyHz).toBeCloseTo(1 / (0.0865 + 0.1445), 3);
    expect(a.means.stanceForceBw).toBeCloseTo((0.0865 + 0.1445) / 0.0865, 2);
  });
});
