import { formatDayLong } from "@/lib/format/dates";
import { LOAD_FLAG_CAUTION } from "@/lib/format/load-caution";
import { renderEmail, type RenderedEmail } from "./layout";
import { alertFacts, type LoadAlertItem } from "./load-alert-parts";

export interface LoadAlertEmailInput extends LoadAlertItem {
  recipientName?: string | null;
  teamName: string;
}

export function loadAlertEmail(input: LoadAlertEmailInput): RenderedEmail {
  const day = formatDayLong(input.date);
  const what =
    input.basis === "planned"
      ? `The plan for ${input.athleteName} raises a load flag for ${day}.`
      : `The sessions ${input.athleteName} logged raise a load flag for ${day}.`;
  return renderEmail({
    subject: `Load flag: ${input.athleteName} · ${input.flagLabel}`,
    preheader: `${input.metricLabel} for ${day}. Please take a look.`,
    heading: `${input.athleteName}: ${input.flagLabel}`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      { kind: "paragraph", text: what },
      { kind: "facts", rows: alertFacts(input) },
      { kind: "button", label: "Open the load page", url: input.loadUrl },
      ...(input.explainUrl
        ? [{ kind: "link", label: "How this figure is worked out", url: input.explainUrl } as const]
        : []),
      { kind: "caution", text: LOAD_FLAG_CAUTION },
    ],
    footer: `You get load flags for ${input.teamName} because of your role in the team.`,
  });
}
