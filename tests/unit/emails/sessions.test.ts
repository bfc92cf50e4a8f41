import { describe, expect, it } from "vitest";
import { sessionCancelledEmail } from "@/emails/session-cancelled";
import { sessionInvitationsEmail } from "@/emails/session-invitations";

const week = [
  {
    date: "2026-04-02",
    startTime: "17:30",
    durationMin: 90,
    title: "Block starts",
    blocks: [{ kind: "acceleration" as const }],
    location: "Track 1",
  },
  {
    date: "2026-03-31",
    startTime: "18:00",
    durationMin: 60,
    title: "Flying 30s",
    blocks: [{ kind: "max_velocity" as const }],
  },
];

describe("session mails", () => {
  it("lists the week's sessions one line each, in order", () => {
    const mail = sessionInvitationsEmail({
      athleteName: "Maya Okafor",
      teamName: "Harbour Vale Sprint Club",
      coachName: "Sam Reed",
      weekStart: "2026-03-30",
      sessions: week,
      planUrl: "https://sprintwright.test/plan",
      feedUrl: "https://sprintwright.test/api/calendar/abc.ics",
    });
    expect(mail.subject).toBe("Your sessions for the week of Mon 30 Mar · Harbour Vale Sprint Club");
    const first = "Tue 31 Mar, 18:00 (1 h): Flying 30s · Max velocity";
    const second = "Thu 2 Apr, 17:30 (1 h 30 min): Block starts · Acceleration, Track 1";
    expect(mail.text.indexOf(`- ${first}`)).toBeGreaterThan(-1);
    expect(mail.text.indexOf(`- ${second}`)).toBeGreaterThan(mail.text.indexOf(first));
    expect(mail.html).toContain(first);
    expect(mail.text).toContain("Sam Reed published 2 sessions for you");
    expect(mail.text).toContain("https://sprintwright.test/api/calendar/abc.ics");
  });

  it("names a single cancelled session in the subject", () => {
    const [one] = week;
    const mail = sessionCancelledEmail({
      athleteName: "Maya",
      teamName: "HVSC",
      sessions: [one!],
      reason: "Track closed",
      planUrl: "https://sprintwright.test/plan",
    });
    expect(mail.subject).toBe("Cancelled: Block starts on Thu 2 Apr");
    expect(mail.text).toContain("Reason: Track closed");
    const many = sessionCancelledEmail({
      athleteName: "Maya",
      teamName: "HVSC",
      sessions: week,
      planUrl: "https://sprintwright.test/plan",
    });
    expect(many.subject).toBe("2 sessions cancelled · HVSC");
  });
});
