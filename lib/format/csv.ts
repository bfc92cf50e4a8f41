import Papa from "papaparse";

// A cell that starts with one of these is run as a formula by spreadsheet programs (CSV injection, OWASP
// "CSV Injection": = + - @ tab CR); the full-width forms are read as formulas in some locales too. Papa's own
// pattern ends in `.*$`, which misses a text with a line break after the formula, so ours looks at the first
// character only. Numbers are never escaped (Papa leaves number cells alone), so -12.5 stays a number.
const FORMULA_START = /^[=+\-@\t\r\n\uFF1D\uFF0B\uFF0D\uFF20]/;

/**
 * CSV text for a header row and data rows; text cells that a spreadsheet would run get a leading apostrophe.
 * `note` goes first as a one-cell line (e.g. the load caution), so it travels with the figures into a spreadsheet.
 */
export function toCsv(fields: string[], data: (string | number)[][], options: { note?: string } = {}): string {
  const table = Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START });
  if (!options.note) return table;
  return `${Papa.unparse([[options.note]], { escapeFormulae: FORMULA_START })}\r\n${table}`;
}
