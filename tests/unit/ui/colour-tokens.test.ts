import { describe, expect, it } from "vitest";
import { KIND_STYLE } from "@/components/ui/kind-style";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import { BLOCK_KINDS } from "@/lib/load/types";
import config from "@/tailwind.config";

const colours = config.theme.extend.colors;

// Contrast ratio as WCAG 2.1 defines it (Understanding SC 1.4.3 and the "relative luminance" and "contrast ratio"
// definitions in the WCAG 2.1 glossary): sRGB channels linearised, L = 0.2126 R + 0.7152 G + 0.0722 B,
// ratio = (L1 + 0.05) / (L2 + 0.05).
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

const PAPERS = [colours.paper.DEFAULT, colours.paper.raised, colours.paper.sunk];
const AA_TEXT = 4.5; // WCAG 2.1 SC 1.4.3, normal text

describe("the formula", () => {
  it("gives the known end points and the familiar grey", () => {
    // 21:1 black on white and 1:1 for a colour on itself follow from the definition; #767676 on white is the
    // lightest grey that passes AA at about 4.54:1 (common practice, from memory).
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrast("#59697f", "#59697f")).toBe(1);
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
  });
});

describe("colour tokens", () => {
  it("ink text shades from 400 up read at 4.5:1 on every paper", () => {
    for (const shade of [400, 500, 600, 700, 800, 900, 950] as const) {
      for (const paper of PAPERS) expect(contrast(colours.ink[shade], paper)).toBeGreaterThanOrEqual(AA_TEXT);
    }
  });

  it("each flag kind has its own tone and its own shape, and its text reads on its soft fill and on paper", () => {
    const kinds = Object.values(FLAG_DISPLAY);
    expect(new Set(kinds.map((d) => d.colour)).size).toBe(kinds.length);
    expect(new Set(kinds.map((d) => d.shape)).size).toBe(kinds.length);
    const flag = colours.flag as Record<string, string>;
    for (const d of kinds) {
      expect(contrast(flag[d.colour], flag[`${d.colour}-soft`])).toBeGreaterThanOrEqual(AA_TEXT);
      for (const paper of PAPERS) expect(contrast(flag[d.colour], paper)).toBeGreaterThanOrEqual(AA_TEXT);
    }
  });

  it("each block kind has its own colour and code; white code on the fill and the fill on its soft chip read", () => {
    const kind = colours.kind as Record<string, { DEFAULT: string; soft: string }>;
    const fills = BLOCK_KINDS.map((k) => kind[k.replace(/_/g, "-")]);
    expect(new Set(fills.map((f) => f.DEFAULT)).size).toBe(BLOCK_KINDS.length);
    expect(new Set(BLOCK_KINDS.map((k) => KIND_STYLE[k].code)).size).toBe(BLOCK_KINDS.length);
    for (const f of fills) {
      expect(contrast("#ffffff", f.DEFAULT)).toBeGreaterThanOrEqual(AA_TEXT);
      expect(contrast(f.DEFAULT, f.soft)).toBeGreaterThanOrEqual(AA_TEXT);
    }
    for (const k of BLOCK_KINDS) expect(KIND_STYLE[k].bar).toBe(`bg-kind-${k.replace(/_/g, "-")}`);
  });

  it("no colour means two things: kinds, flags, states, brand and the action teal share no value", () => {
    const kind = colours.kind as Record<string, { DEFAULT: string }>;
    const flag = colours.flag as Record<string, string>;
    const meanings = [
      ...Object.values(kind).map((k) => k.DEFAULT),
      ...Object.values(FLAG_DISPLAY).map((d) => flag[d.colour]),
      colours.state.published,
      colours.limit.DEFAULT,
      colours.form.error,
      colours.form.ok,
      colours.clay[600],
      colours.lane[500],
      colours.lane[700],
    ];
    expect(new Set(meanings).size).toBe(meanings.length);
  });

  it("the physio-restriction mark and the form messages read on their soft fills and on paper", () => {
    const pairs = [
      [colours.limit.DEFAULT, colours.limit.soft],
      [colours.form.error, colours.form["error-soft"]],
      [colours.form.ok, colours.form["ok-soft"]],
    ];
    for (const [text, fill] of pairs) {
      expect(contrast(text, fill)).toBeGreaterThanOrEqual(AA_TEXT);
      for (const paper of PAPERS) expect(contrast(text, paper)).toBeGreaterThanOrEqual(AA_TEXT);
    }
  });

  it("primary (accent) buttons read at 4.5:1", () => {
    expect(contrast("#ffffff", colours.clay[600])).toBeGreaterThanOrEqual(AA_TEXT);
  });
});
