// Chart colours from tailwind.config.ts tokens (recharts needs raw values, not classes).
export const CHART = {
  actual: "#2a8879", // lane-500
  planned: "#c5cfdc", // ink-200
  acute: "#c9573a", // clay-500
  chronic: "#2b384b", // ink-700
  ratio: "#121a25", // ink-900
  grid: "#e3e8ef", // ink-100
  axis: "#6b7f99", // ink-400
  today: "#9aa9bd", // ink-300
  zones: {
    low: "#e3eff8", // flag-under-soft
    steady: "#e4f2e7", // flag-steady-soft
    rising: "#fdf0db", // flag-climb-soft
    spike: "#fbe6e7", // flag-spike-soft
  },
} as const;

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** "2026-12-02" → "2 Dec" (locale-free, so server and browser agree). */
export function shortDate(date: string): string {
  return `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1]}`;
}
