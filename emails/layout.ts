import { assertWebUrl, escapeHtml, oneLine } from "./escape-html";

/** Building blocks of every Sprintwright mail; each renders to HTML and to plain text. */
export type EmailPart =
  | { kind: "paragraph"; text: string }
  | { kind: "subheading"; text: string }
  | { kind: "facts"; rows: ReadonlyArray<readonly [label: string, value: string]> }
  | { kind: "list"; items: readonly string[] }
  | { kind: "button"; label: string; url: string }
  | { kind: "link"; label: string; url: string }
  | { kind: "caution"; text: string };

export interface EmailContent {
  subject: string;
  /** Hidden preview line most clients show next to the subject. */
  preheader?: string;
  heading: string;
  parts: readonly EmailPart[];
  /** Why the reader gets this mail. */
  footer: string;
}

export interface RenderedEmail {
  subject: string;
  html: string;
  text: string;
}

const INK = "#0f172a";
const MUTED = "#475569";
const LANE = "#0f766e"; // track-lane teal
const LANE_SOFT = "#99d5cb";
const PAGE = "#eef3f2";
const RULE = "#e2e8f0";
const FONT = "-apple-system,'Segoe UI',Roboto,Helvetica,Arial,sans-serif";

function partHtml(part: EmailPart): string {
  switch (part.kind) {
    case "paragraph":
      return `<p style="margin:0 0 16px;">${escapeHtml(part.text)}</p>`;
    case "subheading":
      return `<h2 style="margin:24px 0 8px;font:700 16px/1.4 ${FONT};color:${INK};">${escapeHtml(part.text)}</h2>`;
    case "facts": {
      const rows = part.rows
        .map(
          ([label, value]) =>
            `<tr><td valign="top" style="padding:6px 16px 6px 0;color:${MUTED};white-space:nowrap;">${escapeHtml(label)}</td>` +
            `<td valign="top" style="padding:6px 0;color:${INK};font-weight:600;">${escapeHtml(value)}</td></tr>`,
        )
        .join("");
      return (
        `<table role="presentation" cellpadding="0" cellspacing="0" border="0" ` +
        `style="margin:0 0 16px;font:400 15px/1.5 ${FONT};">${rows}</table>`
      );
    }
    case "list": {
      const items = part.items
        .map((item) => `<tr><td style="padding:8px 0;border-bottom:1px solid ${RULE};">${escapeHtml(item)}</td></tr>`)
        .join("");
      return (
        `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" ` +
        `style="margin:0 0 16px;font:400 15px/1.5 ${FONT};color:${INK};">${items}</table>`
      );
    }
    case "button": {
      const href = escapeHtml(assertWebUrl(part.url));
      return (
        `<table role="presentation" cellpadding="0" cellspacing="0" border="0" style="margin:8px 0 12px;"><tr>` +
        `<td style="border-radius:6px;background:${LANE};">` +
        `<a href="${href}" style="display:inline-block;padding:12px 22px;font:600 15px/1.2 ${FONT};color:#ffffff;` +
        `text-decoration:none;border-radius:6px;">${escapeHtml(part.label)}</a>` +
        `</td></tr></table>` +
        `<p style="margin:0 0 16px;font-size:13px;color:${MUTED};">` +
        `Or open this link: <a href="${href}" style="color:${LANE};word-break:break-all;">${href}</a></p>`
      );
    }
    case "link": {
      const href = escapeHtml(assertWebUrl(part.url));
      return `<p style="margin:0 0 16px;"><a href="${href}" style="color:${LANE};font-weight:600;">${escapeHtml(part.label)}</a></p>`;
    }
    case "caution":
      return (
        `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="margin:8px 0 16px;"><tr>` +
        `<td style="padding:12px 14px;background:#fffbeb;border-left:4px solid #b45309;font:400 14px/1.5 ${FONT};color:${INK};">` +
        `${escapeHtml(part.text)}</td></tr></table>`
      );
  }
}

function partText(part: EmailPart): string {
  switch (part.kind) {
    case "paragraph":
      return part.text;
    case "subheading":
      return `${part.text}\n${"-".repeat(Math.min(part.text.length, 60))}`;
    case "facts":
      return part.rows.map(([label, value]) => `${label}: ${value}`).join("\n");
    case "list":
      return part.items.map((item) => `- ${item}`).join("\n");
    case "button":
    case "link":
      return `${part.label}: ${assertWebUrl(part.url)}`;
    case "caution":
      return `Please note: ${part.text}`;
  }
}

/** One calm, table-based layout (renders in old mail clients; no external images or fonts). */
export function renderEmail(content: EmailContent): RenderedEmail {
  const subject = oneLine(content.subject);
  const preheader = content.preheader
    ? `<div style="display:none;max-height:0;overflow:hidden;opacity:0;color:${PAGE};">${escapeHtml(oneLine(content.preheader))}</div>`
    : "";
  const body = content.parts.map(partHtml).join("\n");

  const html = `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="color-scheme" content="light">
<title>${escapeHtml(subject)}</title>
</head>
<body style="margin:0;padding:0;background:${PAGE};">
${preheader}
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="background:${PAGE};">
<tr><td align="center" style="padding:24px 12px;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0"
  style="max-width:560px;background:#ffffff;border-radius:8px;">
<tr><td style="height:5px;line-height:5px;font-size:0;background:${LANE};border-radius:8px 8px 0 0;">&nbsp;</td></tr>
<tr><td style="height:2px;line-height:2px;font-size:0;background:${LANE_SOFT};">&nbsp;</td></tr>
<tr><td style="padding:20px 28px 0;font:700 14px/1.4 ${FONT};letter-spacing:0.04em;color:${LANE};">Sprintwright</td></tr>
<tr><td style="padding:6px 28px 0;">
<h1 style="margin:0;font:700 22px/1.3 ${FONT};color:${INK};">${escapeHtml(content.heading)}</h1></td></tr>
<tr><td style="padding:16px 28px 8px;font:400 15px/1.6 ${FONT};color:${INK};">
${body}
</td></tr>
<tr><td style="padding:14px 28px 20px;border-top:1px solid ${RULE};font:400 12px/1.5 ${FONT};color:${MUTED};">
${escapeHtml(content.footer)}</td></tr>
</table>
</td></tr>
</table>
</body>
</html>
`;

  const text = [
    `${content.heading}\n${"=".repeat(Math.min(content.heading.length, 60))}`,
    ...content.parts.map(partText),
    // "-- " is the usual signature separator, so clients can dim the footer.
    `-- \nSprintwright · ${content.footer}`,
  ].join("\n\n");

  return { subject, html, text: `${text}\n` };
}
