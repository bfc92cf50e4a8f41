import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { toCsv } from "@/lib/format/csv";
import { LOAD_CAUTION } from "@/lib/load/flag-display";

// OWASP "CSV Injection": a cell beginning with = + - @ tab or CR is treated as a formula by spreadsheet
// programs; prefixing a single quote makes it text. The output is read back with Papa's own parser (RFC 4180).
describe("toCsv", () => {
  it("escapes text cells that would run as formulas and leaves numbers alone", () => {
    const names = [
      '=HYPERLINK("http://evil.test","x")',
      "+1+1",
      "-2+3",
      "@SUM(A1)",
      "\t=1",
      "\r=1",
      "=cmd\nline two",
      "＝1+1",
      "Ada Athlete",
      "x=1",
    ];
    const csv = toCsv(
      ["name", "change"],
      names.map((n, i) => [n, i === 0 ? -12.5 : i]),
    );
    const rows = Papa.parse<string[]>(csv.trim()).data.slice(1);
    expect(rows.map((r) => r[0])).toEqual([...names.slice(0, 8).map((n) => `'${n}`), "Ada Athlete", "x=1"]);
    expect(rows[0][1]).toBe("-12.5");
  });

  it("puts a note (the load caution) first as a line of its own, before the column headers", () => {
    const csv = toCsv(["name", "ACWR"], [["Ada Athlete", 1.61]], { note: LOAD_CAUTION });
    // Read back with Papa's RFC 4180 parser: the caution is one cell (its commas quoted), then the table.
    const rows = Papa.parse<string[]>(csv.trim()).data;
    expect(rows[0]).toEqual([LOAD_CAUTION]);
    expect(rows.slice(1)).toEqual([
      ["name", "ACWR"],
      ["Ada Athlete", "1.61"],
    ]);
    expect(csv.split("\r\n")[0]).toMatch(/^"Load flags are monitoring aids, not diagnoses\./);
  });
});
