// Invitations through the planner's data path and the outbox to the real fake SMTP server: publishing sends
// iTIP REQUESTs (RFC 5546) as iMIP mail (RFC 6047), an edit sends a higher SEQUENCE, a delete a CANCEL.
import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { readRawMail, type StoredMail } from "@/lib/mail/mailbox";
import { publishWeek } from "@/lib/services/plan-week";
import { createSessions, deleteSession, updateSession } from "@/lib/services/plan-sessions";
import { createSessionSchema, updateSessionSchema } from "@/lib/validations/plan";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const n = await setupNotices();
const { d } = n;
const team = await createTestTeam(d, { name: "Invite Club" });
const coach = team.users.coach.userId;
const ada = team.users["ada@inviteclub.test"].athleteId!;
const ben = team.users["ben@inviteclub.test"].athleteId!;
// An athlete without a login has no address: the plan works, no mail is attempted.
const cleo = (
  await d.Athlete.create({
    teamId: team.teamId,
    userId: null,
    groupId: team.groupId,
    name: "Cleo Nologin",
    sex: "female",
    birthDate: null,
    bodyMassKg: null,
    vmaxMs: null,
    vmaxTestedOn: null,
    tauS: null,
    stepLengthM: null,
  })
).id;
const ADA = "ada@inviteclub.test";

const WEEK = "2030-03-04"; // a Monday, far from today so no load alert interferes
const flying = {
  kind: "max_velocity",
  title: "Flying 30s",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: "",
};

async function plan(athleteId: number, date: string, title: string) {
  const input = createSessionSchema.parse({
    from: "blank",
    athleteId,
    date,
    startTime: "17:30",
    durationMin: 60,
    title,
    plannedRpe: 6,
    blocks: [flying],
  });
  return (await createSessions({ teamId: team.teamId, actorUserId: coach, input })).sessions[0]!;
}

function calendarOf(mail: StoredMail) {
  const part = mail.attachments.find((a) => /^text\/calendar/i.test(a.contentType));
  if (!part) throw new Error(`no text/calendar part in "${mail.subject}"`);
  const cal = new ICAL.Component(ICAL.parse(part.content));
  return { part, cal, events: cal.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v)) };
}

/** Content-Type headers of the message as it arrived (mailparser drops their parameters). */
async function rawContentTypes(mail: StoredMail): Promise<string[]> {
  const raw = (await readRawMail({ dir: n.dir, id: mail.id }))!.toString("utf8").replace(/\r\n[ \t]+/g, " ");
  return [...raw.matchAll(/^Content-Type:\s*(.+)$/gim)].map((m) => m[1]!.trim());
}

describe("calendar invitations", () => {
  it("drafts send nothing; publishing the week e-mails each athlete a METHOD:REQUEST with their sessions", async () => {
    await plan(ada, WEEK, "Flys");
    await plan(ada, "2030-03-06", "Starts, curve; bends");
    await plan(ben, WEEK, "Ben flys");
    await plan(cleo, WEEK, "Cleo flys");
    await n.worker.runOnce();
    expect(await n.mailTo(ADA)).toHaveLength(0);

    await publishWeek({ teamId: team.teamId, actorUserId: coach, date: WEEK });
    await n.worker.runOnce();
    const [mail] = await n.mailTo(ADA);
    expect(mail?.subject).toBe("Your sessions for the week of Mon 4 Mar · Invite Club");
    const { part, cal, events } = calendarOf(mail!);
    // RFC 6047 §2.4 / RFC 5545 §8.1: the text/calendar part carries a method parameter equal to METHOD.
    expect(await rawContentTypes(mail!)).toContain("text/calendar; charset=utf-8; method=REQUEST");
    expect(part.content).toContain("METHOD:REQUEST");
    expect(cal.getFirstPropertyValue("method")).toBe("REQUEST");
    expect(events.map((e) => e.summary).sort()).toEqual(["Flys · Max velocity", "Starts, curve; bends · Max velocity"]);
    for (const e of events) {
      // RFC 5546 §3.2.2: a REQUEST names the ORGANIZER and the ATTENDEEs.
      expect(String(e.component.getFirstPropertyValue("organizer")).toLowerCase()).toBe("mailto:coach@inviteclub.test");
      expect(e.attendees.map((a) => String(a.getFirstValue()).toLowerCase())).toEqual([`mailto:${ADA}`]);
      expect(e.sequence).toBe(0);
      expect(e.component.getFirstPropertyValue("dtstamp")).toBeTruthy();
    }
    expect((await n.mailTo("ben@inviteclub.test")).map((m) => calendarOf(m).events.length)).toEqual([1]);
    // Staff get no invitations; Cleo has no address.
    expect(await n.mailTo("coach@inviteclub.test")).toHaveLength(0);
    expect(await d.OutboxMessage.count({ where: { kind: "calendar_request" } })).toBe(2);
  });

  it("moving a published session sends an update with the same UID and a higher SEQUENCE", async () => {
    const row = (await d.PlannedSession.findOne({ where: { athleteId: ada, title: "Flys" } }))!;
    const firstUid = calendarOf((await n.mailTo(ADA))[0]!).events.find((e) => e.summary.startsWith("Flys"))!.uid;
    await updateSession({
      teamId: team.teamId,
      actorUserId: coach,
      sessionId: row.id,
      input: updateSessionSchema.parse({ version: row.version, date: "2030-03-05", startTime: "18:00" }),
    });
    await n.worker.runOnce();
    const mails = await n.mailTo(ADA);
    expect(mails).toHaveLength(2);
    expect(mails[1]!.subject).toBe("Changed: Flys · Invite Club");
    const { cal, events } = calendarOf(mails[1]!);
    expect(cal.getFirstPropertyValue("method")).toBe("REQUEST");
    expect(events).toHaveLength(1);
    expect(events[0]!.uid).toBe(firstUid);
    // RFC 5545 §3.8.7.4: SEQUENCE goes up with each significant revision.
    expect(events[0]!.sequence).toBeGreaterThan(0);
    expect(events[0]!.startDate.toString()).toBe("2030-03-05T18:00:00");
  });

  it("deleting a published session sends METHOD:CANCEL with STATUS:CANCELLED and a SEQUENCE above the update", async () => {
    const row = (await d.PlannedSession.findOne({ where: { athleteId: ada, title: "Flys" } }))!;
    const lastSeq = row.sequence;
    await deleteSession({ teamId: team.teamId, actorUserId: coach, sessionId: row.id, version: row.version });
    await n.worker.runOnce();
    const mails = await n.mailTo(ADA);
    expect(mails).toHaveLength(3);
    expect(mails[2]!.subject).toBe("Cancelled: Flys on Tue 5 Mar");
    const { part, cal, events } = calendarOf(mails[2]!);
    expect(await rawContentTypes(mails[2]!)).toContain("text/calendar; charset=utf-8; method=CANCEL");
    expect(part.content).toContain("METHOD:CANCEL");
    expect(cal.getFirstPropertyValue("method")).toBe("CANCEL");
    // RFC 5546 §3.2.5: every cancelled component carries STATUS:CANCELLED.
    expect(events[0]!.component.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(events[0]!.sequence).toBeGreaterThan(lastSeq);
    expect(events[0]!.sequence).toBeGreaterThan(calendarOf(mails[1]!).events[0]!.sequence);
  });
});
