export const PLYO_LEVEL_LABEL = { beginner: "Beginner", intermediate: "Intermediate", advanced: "Advanced" } as const;

export function formatSpeed(ms: number | null | undefined): string {
  if (ms == null) return "untested";
  return `${ms.toFixed(2)} m/s · ${(ms * 3.6).toFixed(1)} km/h`;
}
