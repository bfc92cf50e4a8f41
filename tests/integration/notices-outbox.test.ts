// The outbox against the real fake SMTP server: same-transaction writes, no double sends between two
// workers, lease takeover after a crash, backoff and giving up, invitations and digests on the same path.
import { describe, expect, it } from "vitest";
import { renderEmail } from "@/emails/layout";
import { addMember } from "@/lib/services/members";
import { updateNotificationSettings } from "@/lib/data/notification-settings";
import { claimDueMessages, enqueueMail, listOutbox, markMessageSent, retryFailedMessage } from "@/lib/data/outbox";
import { backoffDelayMs, DEFAULT_BACKOFF } from "@/lib/notices/backoff";
import { lastDigestSlot, queueDueDigests } from "@/lib/notices/digests";
import { createOutboxWorker } from "@/lib/notices/outbox-worker";
import { addMemberSchema } from "@/lib/validations/members";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const n = await setupNotices();
const { d } = n;
const team = await createTestTeam(d, { name: "Outbox Club" });

const note = (subject: string) =>
  renderEmail({ subject, heading: subject, parts: [{ kind: "paragraph", text: "Hello" }], footer: "Test" });

// Delivery mechanics only: an invitation may go to anyone (team mail to non-members is dropped, notices-recipients.test.ts).
async function queue(to: string, subject: string, extra: { maxAttempts?: number } = {}) {
  return d.sequelize.transaction((transaction) =>
    enqueueMail({ transaction, teamId: team.teamId, kind: "invitation", to, mail: note(subject), ...extra }),
  );
}

describe("outbox", () => {
  it("writes nothing when the change's transaction rolls back", async () => {
    await expect(
      d.sequelize.transaction(async (transaction) => {
        await enqueueMail({
          transaction,
          teamId: team.teamId,
          kind: "alert",
          to: "x@outbox.test",
          mail: note("Never"),
        });
        throw new Error("the plan write failed");
      }),
    ).rejects.toThrow("the plan write failed");
    expect(await d.OutboxMessage.count()).toBe(0);
  });

  it("skips a second message with the same dedupe key", async () => {
    const key = { dedupeKey: "digest:1:1:2026-12-01" };
    const first = await d.sequelize.transaction((transaction) =>
      enqueueMail({
        transaction,
        teamId: team.teamId,
        kind: "invitation",
        to: "a@outbox.test",
        mail: note("Once"),
        ...key,
      }),
    );
    const second = await d.sequelize.transaction((transaction) =>
      enqueueMail({
        transaction,
        teamId: team.teamId,
        kind: "invitation",
        to: "a@outbox.test",
        mail: note("Once"),
        ...key,
      }),
    );
    expect(first).toBeTypeOf("number");
    expect(second).toBeNull();
    await n.worker.runOnce();
    expect(await n.mailTo("a@outbox.test")).toHaveLength(1);
  });

  it("two workers racing over the same queue deliver every message exactly once", async () => {
    for (let i = 0; i < 12; i++) await queue("race@outbox.test", `Race ${i}`);
    const a = createOutboxWorker({ digests: false, log: () => {}, batchSize: 3 });
    const b = createOutboxWorker({ digests: false, log: () => {}, batchSize: 3 });
    const [ra, rb] = await Promise.all([a.runOnce(), b.runOnce()]);
    expect(ra.sent + rb.sent).toBe(12);
    const subjects = (await n.mailTo("race@outbox.test")).map((m) => m.subject).sort();
    expect(subjects).toEqual(Array.from({ length: 12 }, (_, i) => `Race ${i}`).sort());
  });

  it("takes over a message whose worker died mid-send once the lease runs out; the dead worker cannot mark it", async () => {
    const id = await queue("lease@outbox.test", "Leased");
    const t0 = new Date();
    const [held] = await claimDueMessages({ now: t0, limit: 10, leaseMs: 60_000 });
    expect(held?.id).toBe(id);
    // Inside the lease nobody else may take it.
    expect(await claimDueMessages({ now: new Date(t0.getTime() + 30_000), limit: 10, leaseMs: 60_000 })).toEqual([]);
    const later = createOutboxWorker({ digests: false, log: () => {}, now: () => new Date(t0.getTime() + 61_000) });
    expect((await later.runOnce()).sent).toBe(1);
    expect(
      await markMessageSent({ id: held!.id, leaseToken: held!.leaseToken, messageId: "<x@y>", now: new Date() }),
    ).toBe(false);
    expect(await n.mailTo("lease@outbox.test")).toHaveLength(1);
  });

  it("backs off exponentially, gives up after the last attempt with the error kept, and can be retried", async () => {
    // 10 s, 20 s, 40 s … capped at one hour (a policy choice; see lib/notices/backoff.ts).
    expect([1, 2, 3, 4].map((k) => backoffDelayMs(k))).toEqual([10_000, 20_000, 40_000, 80_000]);
    expect(backoffDelayMs(40)).toBe(DEFAULT_BACKOFF.maxMs);

    const id = await queue("down@outbox.test", "Down", { maxAttempts: 2 });
    await n.stopSmtp();
    let clock = Date.now();
    const w = createOutboxWorker({ digests: false, log: () => {}, now: () => new Date(clock) });
    expect(await w.runOnce()).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const row1 = (await d.OutboxMessage.findByPk(id!))!;
    expect(row1.nextAttemptAt.getTime() - clock).toBe(10_000);
    clock += 10_000;
    expect(await w.runOnce()).toEqual({ sent: 0, retrying: 0, failed: 1 });
    const [failed] = await listOutbox({ status: "failed" });
    expect(failed).toMatchObject({ id, attempts: 2 });
    expect(failed!.lastError).toMatch(/ECONNREFUSED|connect/i);

    await n.startSmtp();
    expect(await retryFailedMessage({ id: id!, now: new Date(clock) })).toBe(true);
    expect((await w.runOnce()).sent).toBe(1);
    expect(await n.mailTo("down@outbox.test")).toHaveLength(1);
  });

  it("adding a member queues the invitation e-mail in the same transaction", async () => {
    const input = addMemberSchema.parse({ name: "Nell Newcomer", email: "nell@outbox.test", role: "coach" });
    const { inviteToken } = await addMember({ teamId: team.teamId, input, invitedBy: team.users.head_coach.userId });
    await n.worker.runOnce();
    const [mail] = await n.mailTo("nell@outbox.test");
    expect(mail?.subject).toBe("Hana Head invited you to Outbox Club on Sprintwright");
    expect(mail?.text).toContain(`http://sprintwright.test/invite/${inviteToken}`);
  });

  it("a member on the daily digest gets one mail with the day's alerts at 07:00 team time", async () => {
    const physio = team.users.physio.userId;
    const athleteId = team.users["ada@outboxclub.test"].athleteId!;
    const start = new Date("2026-03-02T06:00:00Z"); // 06:00 in London (GMT)
    await updateNotificationSettings({ userId: physio, teamId: team.teamId, alertEmail: "digest", now: start });
    await d.Alert.create({
      teamId: team.teamId,
      athleteId,
      kind: "spike",
      level: "alert",
      metric: "srpe",
      value: 1.72,
      threshold: 1.5,
      date: "2026-03-03",
      weekStart: "2026-03-02",
      basis: "planned",
      reason: "r",
      note: null,
      acknowledgedBy: null,
      acknowledgedAt: null,
      resolvedBy: null,
      resolvedAt: null,
      createdAt: new Date("2026-03-02T09:00:00Z"),
    });
    expect(lastDigestSlot(new Date("2026-03-03T06:59:00Z"), "Europe/London").toISOString()).toBe(
      "2026-03-02T07:00:00.000Z",
    );
    // Switched at 06:00, so today's 07:00 slot is due at noon: one digest with the 09:00 alert.
    expect(await queueDueDigests({ now: new Date("2026-03-02T12:00:00Z") })).toBe(1);
    // Same day again: nothing; next morning with no new alerts: the window moves on, no empty mail.
    expect(await queueDueDigests({ now: new Date("2026-03-02T13:00:00Z") })).toBe(0);
    expect(await queueDueDigests({ now: new Date("2026-03-03T07:30:00Z") })).toBe(0);
    await n.worker.runOnce();
    const mails = await n.mailTo("physio@outboxclub.test");
    expect(mails.map((m) => m.subject)).toEqual(["1 load flag for Outbox Club · Mon 2 Mar"]);
    expect(mails[0]!.text).toContain(`http://sprintwright.test/load/${athleteId}`);
    expect(mails[0]!.text).toContain("monitoring aids, not diagnoses");
  });
});
