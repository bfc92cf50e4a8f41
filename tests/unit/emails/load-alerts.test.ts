import { describe, expect, it } from "vitest";
import { alertDigestEmail } from "@/emails/alert-digest";
import { loadAlertEmail } from "@/emails/load-alert";
import { LOAD_CAUTION } from "@/lib/load/flag-display";
import { toLoadAlertItem } from "@/lib/notices/alert-display";

// Product safety rule: every mail that shows a load flag carries this caution (html and text).
const CAUTION = LOAD_CAUTION;
const CAUTION_HTML = CAUTION.replace("'", "&#39;");

const base = {
  athleteName: "Maya Okafor",
  flagLabel: "Week-to-week jump",
  metricLabel: "HSR metres",
  value: 1250.4,
  threshold: 1000,
  unit: "m",
  date: "2026-03-31",
  basis: "planned" as const,
  loadUrl: "https://sprintwright.test/squad/a1/load",
};

describe("load alert mails", () => {
  it("single alert: facts, link and the caution in both parts", () => {
    const mail = loadAlertEmail({ ...base, teamName: "Harbour Vale Sprint Club", recipientName: "Dr Priya Nair" });
    expect(mail.subject).toBe("Load flag: Maya Okafor · Week-to-week jump");
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain("Week-to-week jump");
      expect(part).toContain("HSR metres");
      expect(part).toContain("1,250.4 m (above the threshold)");
      expect(part).toContain("1,000 m");
      expect(part).toContain("Tue 31 Mar 2026");
      expect(part).toContain("Planned sessions");
      expect(part).toContain("https://sprintwright.test/squad/a1/load");
    }
    expect(mail.text).toContain(CAUTION);
    expect(mail.html).toContain(CAUTION_HTML);
  });

  it("links each load flag to its section of the explanation page; an override has none", () => {
    const alert = {
      athleteId: 7,
      athleteName: "Maya Okafor",
      metric: "srpe",
      value: 1.7,
      threshold: 1.5,
      date: "2026-03-31",
      basis: "planned" as const,
    };
    const item = toLoadAlertItem({ ...alert, kind: "spike" }, "https://sprintwright.test/");
    expect(item.explainUrl).toBe("https://sprintwright.test/figures#zones");
    const mail = loadAlertEmail({ ...item, teamName: "Harbour Vale Sprint Club" });
    expect(mail.text).toContain("https://sprintwright.test/figures#zones");
    expect(mail.html).toContain("https://sprintwright.test/figures#zones");
    expect(toLoadAlertItem({ ...alert, kind: "weekly_jump" }, "https://x.test").explainUrl).toBe(
      "https://x.test/figures#weekly-change",
    );
    expect(toLoadAlertItem({ ...alert, kind: "restriction_override" }, "https://x.test").explainUrl).toBeNull();
  });

  it("logged-session alerts say so", () => {
    const mail = loadAlertEmail({ ...base, basis: "actual", teamName: "Harbour Vale Sprint Club" });
    expect(mail.text).toContain("Logged sessions");
    expect(mail.text).toContain("The sessions Maya Okafor logged raise a load flag for Tue 31 Mar 2026.");
  });

  it("daily digest: every alert, one caution, both parts", () => {
    const mail = alertDigestEmail({
      teamName: "Harbour Vale Sprint Club",
      date: "2026-03-31",
      alerts: [
        base,
        {
          ...base,
          athleteName: "Lena Hart",
          flagLabel: "ACWR spike",
          metricLabel: "sRPE load",
          value: 1.62,
          threshold: 1.5,
          unit: null,
          direction: "above",
        },
      ],
      inboxUrl: "https://sprintwright.test/alerts",
    });
    expect(mail.subject).toBe("2 load flags for Harbour Vale Sprint Club · Tue 31 Mar");
    expect(mail.text).toContain(CAUTION);
    expect(mail.html).toContain(CAUTION_HTML);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain("Maya Okafor: Week-to-week jump");
      expect(part).toContain("Lena Hart: ACWR spike");
      expect(part).toContain("1.62");
    }
  });

  it("an empty digest is a caller bug", () => {
    expect(() => alertDigestEmail({ teamName: "T", date: "2026-03-31", alerts: [] })).toThrow();
  });
});
