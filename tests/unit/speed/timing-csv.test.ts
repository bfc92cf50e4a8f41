import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseTimingCsv, TIMING_CSV_COLUMNS } from "@/lib/speed/timing-csv";
import { fitSprint } from "@/lib/speed/sprint-fit";

// Our own column layout (lib/speed/README.md §5); the problems are reported per line before anything is saved.
const ATHLETES = [
  { id: 1, name: "Ada Finch" },
  { id: 2, name: "Bo Marsh" },
];
const HEAD = TIMING_CSV_COLUMNS.join(",");
const csv = (...rows: string[]) => [HEAD, ...rows].join("\n");

describe("timing CSV", () => {
  it("the downloadable template reads cleanly and its first trial is the T4 splits (vmax 9.5, τ 1.1)", () => {
    const text = readFileSync(join(__dirname, "../../../public/speed-timing-template.csv"), "utf8");
    const r = parseTimingCsv(text, [{ id: 9, name: "Example Athlete" }]);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.trials).toHaveLength(2);
    const fit = fitSprint(r.trials[0].gates)!;
    expect(Math.abs(fit.vmax - 9.5)).toBeLessThan(1e-3);
    expect(r.trials[1]).toMatchObject({ startType: "flying", flying: { lengthM: 20, timeS: 2.14 }, gates: [] });
  });

  it("groups rows into trials by athlete, date and trial number; names match ignoring case and spaces", () => {
    const r = parseTimingCsv(
      csv(
        "ada  finch,2026-11-01,1,blocks,10,1.9,",
        "Ada Finch,2026-11-01,1,blocks,20,3.1,",
        "BO MARSH,2026-11-01,,crouch,10,2.0,80",
      ),
      ATHLETES,
    );
    expect(r.ok && r.trials.map((t) => [t.athleteId, t.gates.length, t.bodyMassKg])).toEqual([
      [1, 2, null],
      [2, 1, 80],
    ]);
  });

  it("reports every row problem by line: unknown athlete, times going backwards, missing distance, text in numbers", () => {
    const r = parseTimingCsv(
      csv(
        "Nobody Here,2026-11-01,1,standing,10,1.9,",
        "Ada Finch,2026-11-01,1,standing,10,1.9,",
        "Ada Finch,2026-11-01,1,standing,20,1.5,",
        "Ada Finch,2026-11-01,1,standing,,3.1,",
        "Ada Finch,2026-11-01,1,standing,30,4.2s,",
        "Ada Finch,01/11/2026,1,sprint,40,5.3,",
      ),
      ATHLETES,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.file).toBeNull();
    expect(r.problems.map((p) => [p.line, p.column])).toEqual([
      [2, "athlete"],
      [4, "time_s"],
      [5, "distance_m"],
      [6, "time_s"],
      [7, "date"],
      [7, "start"],
    ]);
    expect(r.problems[0].message).toBe('Unknown athlete "Nobody Here"');
    expect(r.problems[1].message).toMatch(/Times go backwards/);
    expect(r.problems[2].message).toBe("The distance is missing");
    expect(r.problems[3].message).toBe('time_s is not a number: "4.2s"');
  });

  it("refuses whole files it cannot read: empty, header only, wrong columns, binary noise", () => {
    const file = (text: string) => {
      const r = parseTimingCsv(text, ATHLETES);
      return r.ok ? null : r.file;
    };
    expect(file("")).toBe("The file is empty");
    expect(file("  \n\n")).toBe("The file is empty");
    expect(file(HEAD)).toBe("The file has a header but no rows");
    expect(file("name,when,seconds\nAda,2026-11-01,1.9")).toMatch(
      /^Wrong columns: missing columns athlete, date, start, distance_m, time_s; unknown columns name, when, seconds/,
    );
    const noise = Array.from({ length: 4096 }, (_, i) => String.fromCharCode((i * 7919) % 256)).join("");
    expect(file(noise)).toBe("The file is not CSV text (it contains control characters)");
    expect(file("x".repeat(10000))).toMatch(/^Wrong columns/);
  });
});
