import type { AlertBasis } from "@/lib/domain/alerts";
import { formatDayLong } from "@/lib/format/dates";
import { formatNumber } from "@/lib/format/number";

/** One load flag as the alert logic hands it to the mail templates. */
export interface LoadAlertItem {
  athleteName: string;
  /** Display name of the flag kind, e.g. "Week-to-week jump". */
  flagLabel: string;
  /** What was measured, e.g. "HSR metres", "ACWR (EWMA)". */
  metricLabel: string;
  value: number;
  threshold: number;
  unit?: string | null;
  /** Whether the value went over (default) or under the threshold; "count" = a tally with no threshold. */
  direction?: "above" | "below" | "count";
  /** The day the flag concerns, YYYY-MM-DD. */
  date: string;
  /** Flags on the plan warn ahead; flags on logged sessions report what happened. */
  basis: AlertBasis;
  /** The athlete's load page in the app. */
  loadUrl: string;
  /** The section of "How figures are worked out" that explains this flag. */
  explainUrl?: string | null;
}

function formatMetricValue(value: number, unit?: string | null): string {
  const u = unit?.trim();
  return u ? `${formatNumber(value, 2)} ${u}` : formatNumber(value, 2);
}

function basisLabel(basis: LoadAlertItem["basis"]): string {
  return basis === "planned" ? "Planned sessions" : "Logged sessions";
}

export function alertFacts(alert: LoadAlertItem): Array<readonly [string, string]> {
  const side = alert.direction === "below" ? "below" : "above";
  if (alert.direction === "count") {
    return [
      ["Flag", alert.flagLabel],
      [alert.metricLabel, formatMetricValue(alert.value, alert.unit)],
      ["Day", formatDayLong(alert.date)],
      ["Based on", basisLabel(alert.basis)],
    ];
  }
  return [
    ["Flag", alert.flagLabel],
    ["Metric", alert.metricLabel],
    ["Value", `${formatMetricValue(alert.value, alert.unit)} (${side} the threshold)`],
    ["Threshold", formatMetricValue(alert.threshold, alert.unit)],
    ["Day", formatDayLong(alert.date)],
    ["Based on", basisLabel(alert.basis)],
  ];
}
