// Plain words for alerts, shared by the inbox (browser) and the alert e-mails (server).
import type { AlertBasis, AlertKind } from "@/lib/domain/alerts";
import { figuresHref, type FiguresTopic } from "@/lib/load/figures-link";
import { FLAG_DISPLAY } from "@/lib/load/flag-display";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import type { LoadAlertItem } from "@/emails/load-alert-parts";

export const ALERT_KIND_LABEL: Record<AlertKind, string> = {
  spike: FLAG_DISPLAY.spike.label,
  weekly_jump: FLAG_DISPLAY.weekly_jump.label,
  plyo_volume: FLAG_DISPLAY.plyo_volume.label,
  recovery: FLAG_DISPLAY.recovery.label,
  restriction_override: "Restriction overridden",
  pain: "Pain reported",
  restriction_conflict: "Plan against a new restriction",
};

export const ALERT_KIND_HINT: Record<AlertKind, string> = {
  spike: FLAG_DISPLAY.spike.hint,
  weekly_jump: FLAG_DISPLAY.weekly_jump.hint,
  plyo_volume: FLAG_DISPLAY.plyo_volume.hint,
  recovery: FLAG_DISPLAY.recovery.hint,
  restriction_override: "A session was planned against a restriction the medical staff set.",
  pain: "The athlete reported pain or discomfort above the team's line with a session log.",
  restriction_conflict:
    "The medical staff set a restriction that sessions already planned break: change or confirm them.",
};

/** Where each alert kind is explained ("How figures are worked out"); overrides are not a load figure. */
export const ALERT_KIND_TOPIC: Record<AlertKind, FiguresTopic | null> = {
  spike: "zones",
  weekly_jump: "weekly-change",
  plyo_volume: "contacts",
  recovery: "recovery",
  restriction_override: null,
  pain: null,
  restriction_conflict: null,
};

function isMetric(value: string | null): value is Metric {
  return value !== null && value in METRIC_INFO;
}

type AlertFacts = { kind: AlertKind; metric: string | null };

/** What was measured, its unit, and whether the threshold is a ceiling or a floor. */
function alertMeasure(alert: AlertFacts): {
  metricLabel: string;
  unit: string | null;
  direction: "above" | "below" | "count";
} {
  switch (alert.kind) {
    case "spike":
      return {
        metricLabel: `ACWR (${isMetric(alert.metric) ? METRIC_INFO[alert.metric].short : "load"})`,
        unit: null,
        direction: "above",
      };
    case "weekly_jump":
      return {
        metricLabel: `${isMetric(alert.metric) ? METRIC_INFO[alert.metric].label : "Load"}: change on last week`,
        unit: "%",
        direction: "above",
      };
    case "plyo_volume":
      return { metricLabel: "Ground contacts in one session", unit: "contacts", direction: "above" };
    case "recovery":
      return { metricLabel: "Time between high-intensity sessions", unit: "h", direction: "below" };
    case "restriction_override":
      return { metricLabel: "Overrides that week", unit: null, direction: "count" };
    case "pain":
      return { metricLabel: "Pain (0–10)", unit: null, direction: "above" };
    case "restriction_conflict":
      return { metricLabel: "Planned sessions that break it", unit: null, direction: "count" };
  }
}

export type AlertForMail = AlertFacts & {
  athleteId: number;
  athleteName: string;
  value: number;
  threshold: number;
  date: string;
  basis: AlertBasis;
};

function loadPageUrl(appUrl: string, athleteId: number): string {
  return `${appUrl.replace(/\/+$/, "")}/load/${athleteId}`;
}

/** The template's input for one alert. */
export function toLoadAlertItem(alert: AlertForMail, appUrl: string): LoadAlertItem {
  const measure = alertMeasure(alert);
  return {
    athleteName: alert.athleteName,
    flagLabel: ALERT_KIND_LABEL[alert.kind],
    metricLabel: measure.metricLabel,
    value: alert.value,
    threshold: alert.threshold,
    unit: measure.unit,
    direction: measure.direction,
    date: alert.date,
    basis: alert.basis,
    loadUrl: loadPageUrl(appUrl, alert.athleteId),
    explainUrl: ALERT_KIND_TOPIC[alert.kind] ? figuresHref(ALERT_KIND_TOPIC[alert.kind]!, appUrl) : null,
  };
}
