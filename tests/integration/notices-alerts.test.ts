// Spike alerts end to end: plan data path → load engine → Alert row + outbox row (same transaction) →
// outbox worker → nodemailer → the real fake SMTP server on a free port → the physio's mailbox.
import { describe, expect, it } from "vitest";
import { listAlerts, updateAlertStatus } from "@/lib/data/alerts";
import { teamToday } from "@/lib/dates/zoned";
import { listOutbox } from "@/lib/data/outbox";
import { getLogTarget } from "@/lib/data/logs";
import { saveSessionLog } from "@/lib/services/session-logs";
import { createSessions, deleteSession, updateSession } from "@/lib/services/plan-sessions";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { createSessionSchema, updateSessionSchema } from "@/lib/validations/plan";
import { alertActionSchema } from "@/lib/validations/alerts";
import { sessionLogSchema } from "@/lib/validations/log";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const n = await setupNotices();
const { d } = n;
const team = await createTestTeam(d, { name: "Notice Club" });
const coach = team.users.coach.userId;
const ada = team.users["ada@noticeclub.test"].athleteId!;
const ben = team.users["ben@noticeclub.test"].athleteId!;
const PHYSIO = "physio@noticeclub.test";
// Only the ACWR spike is under test here: a huge weekly-change limit keeps the week-on-week flag quiet.
await d.TeamLoadSettings.update({ weeklyChangeLimitPct: 10_000 }, { where: { teamId: team.teamId } });

// All dates in the future, so the projected view counts every session as planned (no logs needed).
const w1 = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
const spikeWeek = addDays(w1, 35);

/** Five steady weeks (Mon/Wed/Fri, 60 min at RPE 5 = 300 AU sRPE) written straight to the table: history, not a change. */
async function steadyHistory(athleteId: number) {
  for (let week = 0; week < 6; week++) {
    for (const day of [0, 2, 4]) {
      await d.PlannedSession.create({
        teamId: team.teamId,
        athleteId,
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
}
await steadyHistory(ada);
await steadyHistory(ben);

/** A big extra session on the spike week's Tuesday: 150 min at RPE 10 (1500 AU) through the planner's data path. */
async function planSpike(athleteId: number, date = addDays(spikeWeek, 1)) {
  const input = createSessionSchema.parse({
    from: "blank",
    athleteId,
    date,
    startTime: "10:00",
    durationMin: 150,
    title: "Overload",
    plannedRpe: 10,
    blocks: [],
  });
  const { sessions } = await createSessions({ teamId: team.teamId, actorUserId: coach, input });
  return sessions[0]!;
}

const spikes = async (athleteId: number) =>
  (await listAlerts({ teamId: team.teamId, userId: coach, query: { status: "all", limit: 100, athleteId } })).filter(
    (a) => a.kind === "spike",
  );

describe("spike alerts", () => {
  it("a planned spike records one alert and puts one e-mail in the physio's mailbox", async () => {
    const session = await planSpike(ada);
    const [alert] = await spikes(ada);
    expect(alert).toMatchObject({
      athleteId: ada,
      kind: "spike",
      basis: "planned",
      status: "open",
      flagged: true,
      weekStart: spikeWeek,
    });
    expect(alert!.value).toBeGreaterThanOrEqual(alert!.threshold);
    expect(alert!.threshold).toBe(1.5);

    const round = await n.worker.runOnce();
    expect(round.sent).toBe(1);
    const mails = await n.mailTo(PHYSIO);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toBe("Load flag: Ada Athlete · Spike");
    // The link goes to the athlete's load page; the caution travels with every alert mail.
    expect(mails[0]!.text).toContain(`http://sprintwright.test/load/${ada}`);
    expect(mails[0]!.html).toContain(`http://sprintwright.test/load/${ada}`);
    expect(mails[0]!.text).toContain("monitoring aids, not diagnoses");
    // Coaches did not opt in (their default is off); the athlete never gets load alerts.
    expect(await n.mailTo("coach@noticeclub.test")).toHaveLength(0);
    expect(await n.mailTo("head@noticeclub.test")).toHaveLength(0);
    expect(await n.mailTo("ada@noticeclub.test")).toHaveLength(0);

    // Dragging the same spike to another day and back: still one open alert, no more mail.
    const moved = await updateSession({
      teamId: team.teamId,
      actorUserId: coach,
      sessionId: session.id,
      input: updateSessionSchema.parse({ version: session.version, date: addDays(spikeWeek, 2) }),
    });
    await updateSession({
      teamId: team.teamId,
      actorUserId: coach,
      sessionId: session.id,
      input: updateSessionSchema.parse({ version: moved.sessions[0]!.version, date: addDays(spikeWeek, 1) }),
    });
    await n.worker.runOnce();
    expect(await spikes(ada)).toHaveLength(1);
    expect(await n.mailTo(PHYSIO)).toHaveLength(1);
  });

  it("the same spike planned again after it was taken away does not alert again while the alert is open", async () => {
    const [before] = await spikes(ada);
    const current = (await d.PlannedSession.findOne({ where: { athleteId: ada, title: "Overload" } }))!;
    await deleteSession({ teamId: team.teamId, actorUserId: coach, sessionId: current.id, version: current.version });
    expect((await spikes(ada))[0]).toMatchObject({ id: before!.id, flagged: false, status: "open" });
    await planSpike(ada);
    await n.worker.runOnce();
    expect(await spikes(ada)).toMatchObject([{ id: before!.id, flagged: true }]);
    expect(await n.mailTo(PHYSIO)).toHaveLength(1);
  });

  it("a spike that stays up after the physio resolved it raises nothing new; it must go away and come back", async () => {
    const [open] = await spikes(ada);
    await updateAlertStatus({
      teamId: team.teamId,
      alertId: open!.id,
      userId: team.users.physio.userId,
      input: alertActionSchema.parse({ action: "resolve", note: "Spoke to the coach; planned on purpose." }),
    });
    // Another edit in the week re-evaluates it: the flag is still raised, but it was dealt with.
    const extra = createSessionSchema.parse({
      from: "blank",
      athleteId: ada,
      date: addDays(spikeWeek, 5),
      startTime: "09:00",
      durationMin: 20,
      title: "Walk",
      plannedRpe: 1,
      blocks: [],
    });
    await createSessions({ teamId: team.teamId, actorUserId: coach, input: extra });
    await n.worker.runOnce();
    expect(await spikes(ada)).toHaveLength(1);
    expect(await n.mailTo(PHYSIO)).toHaveLength(1);
  });

  it("with the SMTP server down the notice waits in the outbox and arrives exactly once when it is back", async () => {
    await n.stopSmtp();
    await planSpike(ben);
    const first = await n.worker.runOnce();
    expect(first).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const [waiting] = await listOutbox({ teamId: team.teamId, status: "pending" });
    expect(waiting).toMatchObject({ kind: "alert", toEmail: PHYSIO, attempts: 1 });
    expect(waiting!.lastError).toMatch(/ECONNREFUSED|connect/i);

    await n.startSmtp();
    // Backoff: not due yet, so nothing is sent before the retry time…
    expect((await n.worker.runOnce()).sent).toBe(0);
    // …and once it is, exactly one copy goes out, however many rounds run afterwards.
    await d.OutboxMessage.update({ nextAttemptAt: new Date(Date.now() - 1000) }, { where: { status: "pending" } });
    const rounds = await Promise.all([n.worker.runOnce(), n.worker.runOnce()]);
    expect(rounds[0]).toEqual({ sent: 1, retrying: 0, failed: 0 });
    await n.worker.runOnce();
    const benMails = (await n.mailTo(PHYSIO)).filter((m) => m.subject.includes("Ben Athlete"));
    expect(benMails).toHaveLength(1);
    const [sent] = await listOutbox({ teamId: team.teamId, status: "sent" });
    expect(sent).toMatchObject({ attempts: 2, lastError: null });
    // The stable Message-ID the outbox chose is the one that arrived.
    const row = (await d.OutboxMessage.findByPk(sent!.id))!;
    expect(benMails[0]!.messageId).toBe(row.messageId);
    expect(row.messageId).toMatch(new RegExp(`^<outbox-${row.id}-\\d+@sprintwright\\.local>$`));
  });

  it("a log that makes the actual load spike records an alert based on logged sessions", async () => {
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    const dora = (
      await d.Athlete.create({
        teamId: team.teamId,
        userId: null,
        groupId: team.groupId,
        name: "Dora Logger",
        sex: "female",
        birthDate: null,
        bodyMassKg: null,
        vmaxMs: null,
        vmaxTestedOn: null,
        tauS: null,
        stepLengthM: null,
      })
    ).id;
    // Five weeks of logged steady work before today (every other day, 60 min at RPE 5).
    for (let back = 35; back >= 1; back -= 2) {
      const s = await d.PlannedSession.create({
        teamId: team.teamId,
        athleteId: dora,
        date: addDays(today, -back),
        startTime: "17:00",
        durationMin: 60,
        title: "Steady",
        plannedRpe: 5,
        status: "published",
        notes: null,
        publishedAt: new Date(),
      });
      await d.SessionLog.create({
        sessionId: s.id,
        athleteId: dora,
        completion: "yes",
        rpe: 5,
        minutes: 60,
        completedReps: null,
        notes: null,
      });
    }
    const planned = await d.PlannedSession.create({
      teamId: team.teamId,
      athleteId: dora,
      date: today,
      startTime: "07:00",
      durationMin: 60,
      title: "Steady",
      plannedRpe: 5,
      status: "published",
      notes: null,
      publishedAt: new Date(),
    });
    const target = (await getLogTarget({ sessionId: planned.id }))!;
    // The athlete's log, through the load engineer's data path (which calls afterLogChange in its transaction).
    await saveSessionLog({
      target,
      input: sessionLogSchema.parse({ completion: "yes", rpe: 10, minutes: 300 }),
      actorUserId: coach,
      today,
    });
    const [alert] = await spikes(dora);
    expect(alert).toMatchObject({ kind: "spike", basis: "actual", status: "open", weekStart: startOfWeek(today, 1) });
    await n.worker.runOnce();
    const mail = (await n.mailTo(PHYSIO)).find((m) => m.subject === "Load flag: Dora Logger · Spike");
    expect(mail?.text).toContain("The sessions Dora Logger logged raise a load flag");
    // Saving the same log again changes nothing that is new.
    await saveSessionLog({
      target,
      input: sessionLogSchema.parse({ completion: "yes", rpe: 10, minutes: 300 }),
      actorUserId: coach,
      today,
    });
    await n.worker.runOnce();
    expect((await n.mailTo(PHYSIO)).filter((m) => m.subject === "Load flag: Dora Logger · Spike")).toHaveLength(1);
  });
});
