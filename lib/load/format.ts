// Locale-free number text, so reasons read the same on the server and in the browser (no hydration drift).

/** 1250.4 → "1,250"; 3493.856 with 2 decimals → "3,493.86". */
export function formatNumber(value: number, decimals = 0): string {
  const fixed = Math.abs(value).toFixed(decimals);
  const [whole, frac] = fixed.split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  const sign = value < 0 && Number(fixed) !== 0 ? "-" : "";
  return frac ? `${sign}${grouped}.${frac}` : `${sign}${grouped}`;
}

export function formatRatio(value: number): string {
  return value.toFixed(2);
}
