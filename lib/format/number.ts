import { formatNumber as fixedDecimals } from "@/lib/load/format";

/** Locale-free number for people, without trailing zeros: 1,250 or 95.5 (same text on server and browser). */
export function formatNumber(value: number, maxFractionDigits = 1): string {
  if (!Number.isFinite(value)) return "–";
  const text = fixedDecimals(value, maxFractionDigits);
  return text.includes(".") ? text.replace(/\.?0+$/, "") : text;
}

/** "1 drill", "3 drills": English plural by count. */
export function plural(count: number, one: string, many = `${one}s`): string {
  return `${formatNumber(count, 0)} ${count === 1 ? one : many}`;
}
