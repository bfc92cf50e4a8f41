import { describe, expect, it } from "vitest";
import { alertDigestEmail } from "@/emails/alert-digest";
import { escapeHtml } from "@/emails/escape-html";
import { loadAlertEmail } from "@/emails/load-alert";
import { memberInvitationEmail } from "@/emails/member-invitation";
import { passwordResetEmail } from "@/emails/password-reset";
import { sessionCancelledEmail } from "@/emails/session-cancelled";
import { sessionInvitationsEmail } from "@/emails/session-invitations";
import type { RenderedEmail } from "@/emails/layout";

const EVIL = `<img src=x onerror="alert('x')">&amp;`;
const session = {
  date: "2026-03-30",
  startTime: "18:00",
  durationMin: 60,
  title: EVIL,
  blocks: [{ kind: "tempo" as const }],
};
const alert = {
  athleteName: EVIL,
  flagLabel: EVIL,
  metricLabel: "HSR metres",
  value: 812.5,
  threshold: 700,
  unit: "m",
  date: "2026-03-30",
  basis: "planned" as const,
  loadUrl: "https://sprintwright.test/squad/a1/load?x=1&y=<2>",
};

const rendered: Array<[string, RenderedEmail]> = [
  [
    "member invitation",
    memberInvitationEmail({
      inviteeName: EVIL,
      teamName: EVIL,
      role: "athlete",
      inviterName: EVIL,
      acceptUrl: "https://sprintwright.test/invite/t0k",
      expiresAt: new Date("2026-12-08T21:44:00Z"),
      timeZone: "Europe/London",
    }),
  ],
  [
    "password reset",
    passwordResetEmail({
      name: EVIL,
      resetUrl: "https://sprintwright.test/reset/abc",
      expiresAt: new Date("2026-12-01T22:44:00Z"),
    }),
  ],
  ["load alert", loadAlertEmail({ ...alert, teamName: EVIL, recipientName: EVIL })],
  [
    "alert digest",
    alertDigestEmail({ teamName: EVIL, date: "2026-03-30", alerts: [alert, { ...alert, athleteName: "Lena Hart" }] }),
  ],
  [
    "session invitations",
    sessionInvitationsEmail({
      athleteName: EVIL,
      teamName: EVIL,
      weekStart: "2026-03-30",
      sessions: [session],
      planUrl: "https://sprintwright.test/plan",
    }),
  ],
  [
    "session cancelled",
    sessionCancelledEmail({
      athleteName: EVIL,
      teamName: EVIL,
      sessions: [session],
      reason: EVIL,
      planUrl: "https://sprintwright.test/plan",
    }),
  ],
];

describe("e-mail escaping", () => {
  it("escapes the five HTML specials", () => {
    expect(escapeHtml(`<a href="x">Tom & 'Jo'</a>`)).toBe(
      "&lt;a href=&quot;x&quot;&gt;Tom &amp; &#39;Jo&#39;&lt;/a&gt;",
    );
  });

  it.each(rendered)("%s: interpolated values never reach the HTML unescaped", (_name, mail) => {
    expect(mail.html).not.toContain("<img");
    expect(mail.html).not.toContain(`onerror="`);
    expect(mail.html).toContain("&lt;img src=x onerror=&quot;alert(&#39;x&#39;)&quot;&gt;&amp;amp;");
    // Plain text is not HTML: the value reads as typed there.
    expect(mail.text).toContain(EVIL);
    expect(mail.subject).not.toMatch(/[\r\n]/);
    expect(mail.html).not.toMatch(/<link|@import|url\(|<img\b/i); // no external images or fonts
  });

  it("escapes link URLs inside href attributes", () => {
    const mail = loadAlertEmail({ ...alert, teamName: "Harbour Vale Sprint Club" });
    expect(mail.html).toContain(`href="https://sprintwright.test/squad/a1/load?x=1&amp;y=%3C2%3E"`);
  });

  it("refuses links that are not http(s)", () => {
    expect(() => passwordResetEmail({ resetUrl: "javascript:alert(1)", expiresAt: new Date() })).toThrow(/http/);
  });

  it("keeps header injection out of the subject", () => {
    const mail = memberInvitationEmail({
      teamName: "A\r\nBcc: x@y.test",
      role: "coach",
      inviterName: "Sam",
      acceptUrl: "https://s.test/i",
      expiresAt: new Date(),
    });
    expect(mail.subject).toBe("Sam invited you to A Bcc: x@y.test on Sprintwright");
  });
});
