// Only members who accepted receive the team's alerts, digests and calendar mail (issue 10, defect 10): an
// invited physio whose invitation expired, or an invitation sent to a mistyped address, gets the invitation
// and nothing else. Real path: planner data write → load engine → outbox → fake SMTP → mailbox folder.
import { describe, expect, it } from "vitest";
import { teamToday } from "@/lib/dates/zoned";
import { listAlertRecipients, listAthleteContacts, listDigestSubscribers } from "@/lib/data/notification-settings";
import { addMember, removeMember } from "@/lib/services/members";
import { enqueueMail, listOutbox } from "@/lib/data/outbox";
import { createSessions } from "@/lib/services/plan-sessions";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { addMemberSchema } from "@/lib/validations/members";
import { createSessionSchema } from "@/lib/validations/plan";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const n = await setupNotices();
const { d } = n;
const team = await createTestTeam(d, { name: "Recipient Club" });
const head = team.users.head_coach!.userId;
const ada = team.users["ada@recipientclub.test"]!.athleteId!;
const PHYSIO = "physio@recipientclub.test";
const EXPIRED = "nell.physio@recipientclub.test";
const MISTYPED = "physoi@recipientclub.test";
await d.TeamLoadSettings.update({ weeklyChangeLimitPct: 10_000 }, { where: { teamId: team.teamId } });

const invite = (input: Record<string, unknown>, now?: Date) =>
  addMember({ teamId: team.teamId, input: addMemberSchema.parse(input), invitedBy: head, now });
// Invited nine days ago (links work seven) and never accepted; and one sent to a typo today.
await invite({ name: "Nell Physio", email: EXPIRED, role: "physio" }, new Date(Date.now() - 9 * 86_400_000));
await invite({ name: "Pia Physio", email: MISTYPED, role: "physio" });
const pendingAthlete = await invite({ name: "Ria Runner", email: "ria@recipientclub.test", role: "athlete" });
await n.worker.runOnce(); // the three invitations go out

const w1 = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
for (let week = 0; week < 6; week++) {
  for (const day of [0, 2, 4]) {
    await d.PlannedSession.create({
      teamId: team.teamId,
      athleteId: ada,
      date: addDays(w1, week * 7 + day),
      startTime: "17:00",
      durationMin: 60,
      title: "Steady",
      plannedRpe: 5,
      status: "published",
      notes: null,
      publishedAt: new Date(),
    });
  }
}

describe("who receives the team's mail", () => {
  it("alert recipients are the staff who joined, not open or expired invitations", async () => {
    const emails = (await listAlertRecipients({ teamId: team.teamId })).map((r) => r.email);
    expect(emails).toContain(PHYSIO);
    expect(emails).not.toContain(EXPIRED);
    expect(emails).not.toContain(MISTYPED);
  });

  it("a load flag e-mails the physio who joined and nobody merely invited", async () => {
    const input = createSessionSchema.parse({
      from: "blank",
      athleteId: ada,
      date: addDays(w1, 36),
      startTime: "10:00",
      durationMin: 150,
      title: "Overload",
      plannedRpe: 10,
      blocks: [],
    });
    await createSessions({ teamId: team.teamId, actorUserId: team.users.coach!.userId, input });
    await n.worker.runOnce();
    expect((await n.mailTo(PHYSIO)).map((m) => m.subject)).toContain("Load flag: Ada Athlete · Spike");
    for (const address of [EXPIRED, MISTYPED]) {
      const mails = await n.mailTo(address);
      expect(mails.map((m) => m.subject)).toEqual(["Hana Head invited you to Recipient Club on Sprintwright"]);
      expect(mails.map((m) => m.text).join("\n")).not.toContain("Ada Athlete");
    }
  });

  it("the daily digest skips a settings row of someone who never joined", async () => {
    const user = await d.User.findOne({ where: { email: EXPIRED } });
    await d.NotificationSetting.create({
      teamId: team.teamId,
      userId: user!.id,
      alertEmail: "digest",
      lastDigestAt: null,
      alertsSeenAt: null,
    });
    expect((await listDigestSubscribers()).map((s) => s.email)).not.toContain(EXPIRED);
  });

  it("an invited athlete gets no calendar mail until joining", async () => {
    expect(await listAthleteContacts({ teamId: team.teamId, athleteIds: [pendingAthlete.athleteId!] })).toEqual(
      new Map(),
    );
    const input = createSessionSchema.parse({
      from: "blank",
      athleteId: pendingAthlete.athleteId,
      date: addDays(w1, 2),
      startTime: "09:00",
      durationMin: 45,
      title: "Starts",
      plannedRpe: 5,
      blocks: [],
    });
    await createSessions({ teamId: team.teamId, actorUserId: head, input });
    await n.worker.runOnce();
    expect((await n.mailTo("ria@recipientclub.test")).map((m) => m.subject)).toEqual([
      "Hana Head invited you to Recipient Club on Sprintwright",
    ]);
  });

  it("mail queued for someone removed before it went out is not sent", async () => {
    const coach = team.users.coach!;
    await d.sequelize.transaction((transaction) =>
      enqueueMail({
        transaction,
        teamId: team.teamId,
        kind: "alert",
        to: "coach@recipientclub.test",
        mail: { subject: "Queued flag", html: "<p>Ada</p>", text: "Ada Athlete" },
      }),
    );
    await removeMember({ teamId: team.teamId, membershipId: coach.membershipId });
    await n.worker.runOnce();
    expect((await n.mailTo("coach@recipientclub.test")).map((m) => m.subject)).not.toContain("Queued flag");
    const [row] = (await listOutbox({ teamId: team.teamId, status: "failed" })).filter(
      (r) => r.toEmail === "coach@recipientclub.test",
    );
    expect(row!.lastError).toMatch(/not a member/);
  });

  it("a membership of an account that cannot sign in (older data) receives nothing either", async () => {
    const ghost = await d.User.create({ name: "Ghost Physio", email: "ghost@recipientclub.test", passwordHash: null });
    await d.Membership.create({ teamId: team.teamId, userId: ghost.id, role: "physio" });
    expect((await listAlertRecipients({ teamId: team.teamId })).map((r) => r.email)).not.toContain(
      "ghost@recipientclub.test",
    );
  });
});
