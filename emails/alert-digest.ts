import { formatDayLong, formatDayShort } from "@/lib/format/dates";
import { LOAD_FLAG_CAUTION } from "@/lib/format/load-caution";
import { plural } from "@/lib/format/number";
import { renderEmail, type EmailPart, type RenderedEmail } from "./layout";
import { alertFacts, type LoadAlertItem } from "./load-alert-parts";

export interface AlertDigestEmailInput {
  recipientName?: string | null;
  teamName: string;
  /** The day the digest covers, YYYY-MM-DD. */
  date: string;
  alerts: readonly LoadAlertItem[];
  /** The alert list in the app, if there is one. */
  inboxUrl?: string | null;
}

export function alertDigestEmail(input: AlertDigestEmailInput): RenderedEmail {
  if (input.alerts.length === 0) throw new RangeError("An alert digest needs at least one alert");
  const count = plural(input.alerts.length, "load flag");
  const athletes = new Set(input.alerts.map((a) => a.athleteName)).size;
  const perAlert = input.alerts.flatMap((alert): EmailPart[] => [
    { kind: "subheading", text: `${alert.athleteName}: ${alert.flagLabel}` },
    { kind: "facts", rows: alertFacts(alert) },
    { kind: "link", label: `Open ${alert.athleteName}'s load page`, url: alert.loadUrl },
    ...(alert.explainUrl
      ? [{ kind: "link", label: "How this figure is worked out", url: alert.explainUrl } as const]
      : []),
  ]);
  return renderEmail({
    subject: `${count} for ${input.teamName} · ${formatDayShort(input.date)}`,
    preheader: `${count} for ${plural(athletes, "athlete")}.`,
    heading: `${count} for ${formatDayLong(input.date)}`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      {
        kind: "paragraph",
        text: `Here are the load flags for ${input.teamName} (${plural(athletes, "athlete")}) in one mail.`,
      },
      { kind: "caution", text: LOAD_FLAG_CAUTION },
      ...perAlert,
      ...(input.inboxUrl ? [{ kind: "button", label: "See all alerts", url: input.inboxUrl } as const] : []),
    ],
    footer: `You get a daily summary of load flags for ${input.teamName} because of your role in the team.`,
  });
}
