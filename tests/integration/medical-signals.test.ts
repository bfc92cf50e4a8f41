// Issue #13's signals that reached nobody, end to end through the route handlers, the write transaction, the
// outbox and the real fake SMTP server: an athlete's log note and the session's thread (each message e-mailed to
// the others in it), a restriction set after sessions were planned (listed, coaches told, the athlete's session
// marked, the override mail to the athlete naming it) and availability enforced by the planner's one guard.
import { describe, expect, it, vi } from "vitest";
import { listAlerts } from "@/lib/data/alerts";
import { recentLogNotes } from "@/lib/data/log-notes";
import { listSessionConflicts, medicalChangesFor } from "@/lib/data/session-conflicts";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { formatDayShort } from "@/lib/format/dates";
import { MEDICAL_CHANGE_NOTICE } from "@/lib/restrictions/conflicts";
import { saveSessionLog } from "@/lib/services/session-logs";
import { getLogTarget } from "@/lib/data/logs";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const who: { userId: number | null } = { userId: null };
vi.mock("next-auth", async (orig) => ({
  ...(await orig<typeof import("next-auth")>()),
  getServerSession: async () => (who.userId ? { user: { id: who.userId } } : null),
}));

const n = await setupNotices();
const { d } = n;
const messages = await import("@/app/api/sessions/[sessionId]/messages/route");
const restrictions = await import("@/app/api/athletes/[athleteId]/restrictions/route");
const availability = await import("@/app/api/athletes/[athleteId]/availability/route");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const session = await import("@/app/api/sessions/[sessionId]/route");

const team = await createTestTeam(d, { name: "Signal Club" });
const T = String(team.teamId);
const { coach, physio, head_coach: head } = team.users;
const ada = team.users["ada@signalclub.test"]!;
const ben = team.users["ben@signalclub.test"]!;
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
// Next week: every session there is still plan, whatever today is.
const week = addDays(startOfWeek(today, 1), 7);
const [mon, tue, wed, thu] = [0, 1, 2, 3].map((k) => addDays(week, k));

const p = <V>(v: V) => ({ params: Promise.resolve(v) });
const send = (path: string, method: string, body?: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
type Body = Record<string, unknown> & { error?: { code: string; message: string; fields?: Record<string, string[]> } };
const json = async (res: Response) => ({ status: res.status, body: (await res.json()) as Body });
const as = (userId: number) => {
  who.userId = userId;
};

const flysRunning = { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 };
async function published(athleteId: number, date: string, kind: string, title: string, running: object | null) {
  const s = await d.PlannedSession.create({
    teamId: team.teamId,
    athleteId,
    date,
    startTime: "16:00",
    durationMin: 50,
    title,
    plannedRpe: 6,
    status: "published",
    notes: null,
    publishedAt: new Date(),
  });
  await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 0,
    kind: kind as "max_velocity",
    title,
    running: running as never,
    drills: null,
    notes: null,
  });
  return s;
}
const strength = await d.BlockTemplate.create({
  teamId: team.teamId,
  kind: "strength",
  title: "Split squats",
  running: null,
  drills: null,
  notes: null,
  durationMin: 30,
  plannedRpe: 4,
});
const flysTemplate = await d.BlockTemplate.create({
  teamId: team.teamId,
  kind: "max_velocity",
  title: "Flying 30s",
  running: flysRunning as never,
  drills: null,
  notes: null,
  durationMin: 50,
  plannedRpe: 7,
});

const thread = (sessionId: number) =>
  messages.GET(send(`/api/sessions/${sessionId}/messages`, "GET"), p({ sessionId: String(sessionId) })).then(json);
const post = (sessionId: number, body: unknown) =>
  messages
    .POST(send(`/api/sessions/${sessionId}/messages`, "POST", body), p({ sessionId: String(sessionId) }))
    .then(json);
const subjects = async (email: string) => (await n.mailTo(email)).map((m) => m.subject);

describe("an athlete's log note reaches the staff, and the session's thread answers it", async () => {
  const past = await published(ada.athleteId!, addDays(today, -1), "acceleration", "Block starts", {
    ...flysRunning,
    start: "block",
    runInM: 0,
    intensityPct: 90,
  });
  const note = "Felt a twinge in the left hamstring";
  await saveSessionLog({
    target: (await getLogTarget({ sessionId: past.id }))!,
    input: { completion: "partly", rpe: 7, minutes: 40, completedReps: null, notes: note },
    actorUserId: ada.userId,
    today,
  });

  it("the note is in the staff's read function (the coach's Today, the physio's squad status)", async () => {
    const notes = await recentLogNotes({ teamId: team.teamId });
    expect(notes).toEqual([
      expect.objectContaining({ sessionId: past.id, athleteId: ada.athleteId, athleteName: "Ada Athlete", note }),
    ]);
    // Another team sees nothing of it.
    expect(await recentLogNotes({ teamId: team.teamId + 999 })).toEqual([]);
  });

  it("the session's thread shows the note to the coach and the physio; another athlete gets 404", async () => {
    for (const viewer of [coach, physio, head]) {
      as(viewer.userId);
      const res = await thread(past.id);
      expect(res.status).toBe(200);
      expect(res.body.log).toMatchObject({ notes: note, completion: "partly", rpe: 7 });
    }
    as(ben.userId);
    expect((await thread(past.id)).status).toBe(404);
    expect((await post(past.id, { body: "Hi" })).status).toBe(404);
    as(ada.userId);
    expect((await thread(past.id)).status).toBe(200);
  });

  it("each message is e-mailed, through the outbox and SMTP, to the others in the thread and not its author", async () => {
    as(physio.userId);
    const first = await post(past.id, { body: "Thanks Ada. Come to the clinic at 9 tomorrow." });
    expect(first.status).toBe(201);
    as(coach.userId);
    expect((await post(past.id, { body: "I will take flys out of Thursday." })).status).toBe(201);
    as(ada.userId);
    const last = await post(past.id, { body: "Will do, thank you" });
    expect((last.body.messages as unknown[]).length).toBe(3);
    // The count the staff lists show beside a note (a grouped count per session; none for a session without any).
    const { countSessionMessages } = await import("@/lib/data/session-messages");
    expect(await countSessionMessages({ sessionIds: [past.id, past.id + 10_000] })).toEqual(new Map([[past.id, 3]]));
    await n.worker.runOnce();
    const about = (s: string[]) => s.filter((x) => x.includes("Ada Athlete's session"));
    // Ada: from the physio and the coach; the physio: from the coach and Ada; the coach: from Ada only.
    expect(about(await subjects("ada@signalclub.test"))).toHaveLength(2);
    expect(about(await subjects("physio@signalclub.test"))).toHaveLength(2);
    expect(about(await subjects("coach@signalclub.test"))).toEqual([expect.stringMatching(/^Ada Athlete on/)]);
    // The head coach never wrote in it: not in the thread.
    expect(about(await subjects("head@signalclub.test"))).toEqual([]);
    const toAda = (await n.mailTo("ada@signalclub.test")).filter((m) => m.subject.startsWith("Pia Physio"));
    expect(toAda[0]!.text).toContain("Come to the clinic at 9 tomorrow.");
    expect(toAda[0]!.text).toContain(`/me#session-${past.id}`);
  });

  it("an empty or overlong message is a 400 naming body; nothing is stored", async () => {
    as(coach.userId);
    const before = await d.SessionMessage.count();
    const empty = await post(past.id, { body: "   " });
    expect(empty.status).toBe(400);
    expect(empty.body.error?.fields).toHaveProperty("body");
    expect((await post(past.id, { body: "x".repeat(1001) })).status).toBe(400);
    expect(await d.SessionMessage.count()).toBe(before);
  });

  it("an athlete gets 404 for a draft's thread", async () => {
    const draft = await d.PlannedSession.create({
      teamId: team.teamId,
      athleteId: ada.athleteId!,
      date: mon,
      startTime: "16:00",
      durationMin: 30,
      title: "Still shaping",
      plannedRpe: 4,
      status: "draft",
      notes: null,
      publishedAt: null,
    });
    as(ada.userId);
    expect((await thread(draft.id)).status).toBe(404);
    as(coach.userId);
    expect((await thread(draft.id)).status).toBe(200);
  });
});

describe("a restriction set after sessions were planned", async () => {
  const flys = await published(ada.athleteId!, wed, "max_velocity", "Flying 30s", flysRunning);
  const easy = await published(ada.athleteId!, tue, "strength", "Split squats", null);
  const restrict = (body: unknown) =>
    restrictions
      .POST(send(`/api/athletes/${ada.athleteId}/restrictions`, "POST", body), p({ athleteId: String(ada.athleteId) }))
      .then(json);

  it("lists every planned session that breaks it, alerts the coaches, e-mails them and marks the athlete's session", async () => {
    as(physio.userId);
    const res = await restrict({
      rule: "no_kind",
      blockKinds: ["max_velocity"],
      startsOn: today,
      endsOn: addDays(week, 6),
      note: "Hamstring: no flying sprints",
    });
    expect(res.status).toBe(201);
    expect(res.body.conflicts).toEqual([
      expect.objectContaining({
        sessionId: flys.id,
        date: wed,
        status: "published",
        detail: "Flying 30s: max velocity",
      }),
    ]);
    // The physio's list of conflicts (squad status, the athlete's medical page) holds it too.
    expect((await listSessionConflicts({ teamId: team.teamId, from: today })).map((c) => c.sessionId)).toEqual([
      flys.id,
    ]);
    const alerts = await listAlerts({
      teamId: team.teamId,
      userId: coach.userId,
      query: { status: "unresolved", limit: 50, athleteId: ada.athleteId! },
    });
    const conflict = alerts.filter((a) => a.kind === "restriction_conflict");
    expect(conflict).toHaveLength(1);
    expect(conflict[0]!.reason).toContain("Flying 30s");
    expect(conflict[0]!.value).toBe(1);
    // What the athlete's screens read: that one session, with the restriction in words.
    const marked = await medicalChangesFor({ teamId: team.teamId, athleteId: ada.athleteId!, from: today });
    expect([...marked.keys()]).toEqual([flys.id]);
    expect(marked.get(flys.id)![0]).toMatch(/^No max velocity/);
    expect(marked.has(easy.id)).toBe(false);

    await n.worker.runOnce();
    for (const email of ["coach@signalclub.test", "head@signalclub.test"]) {
      const mails = (await n.mailTo(email)).filter((m) => m.subject.startsWith("Plan to change"));
      expect(mails).toHaveLength(1);
      expect(mails[0]!.text).toContain("Flying 30s");
      expect(mails[0]!.text).toContain("Hamstring: no flying sprints");
    }
    expect((await subjects("physio@signalclub.test")).filter((s) => s.startsWith("Plan to change"))).toEqual([]);
    // The athlete hears it in the words their screens use, once, about the published session only.
    const toAda = (await n.mailTo("ada@signalclub.test")).filter((m) =>
      m.subject.startsWith("Changed by your medical staff"),
    );
    expect(toAda.map((m) => m.subject)).toEqual([
      `Changed by your medical staff: Flying 30s on ${formatDayShort(wed)}`,
    ]);
    expect(toAda[0]!.text).toContain(`${MEDICAL_CHANGE_NOTICE} before you train.`);
    expect(toAda[0]!.text).toContain("No max velocity");
    expect(toAda[0]!.text).toContain("Flying 30s: max velocity");
    expect(toAda[0]!.text).not.toContain("Split squats");
    expect(toAda[0]!.text).toContain(`/me#session-${flys.id}`);
    // The physio's own note stays with the staff.
    expect(toAda[0]!.text).not.toContain("Hamstring: no flying sprints");
  });

  it("a restriction that only drafts break tells the coaches, not the athlete", async () => {
    const draft = await published(ben.athleteId!, thu, "max_velocity", "Draft flys", flysRunning);
    await draft.update({ status: "draft", publishedAt: null });
    as(physio.userId);
    const res = await restrictions
      .POST(
        send(`/api/athletes/${ben.athleteId}/restrictions`, "POST", {
          rule: "no_kind",
          blockKinds: ["max_velocity"],
          startsOn: today,
          endsOn: addDays(week, 6),
          note: "Achilles",
        }),
        p({ athleteId: String(ben.athleteId) }),
      )
      .then(json);
    expect(res.status).toBe(201);
    expect(res.body.conflicts).toEqual([expect.objectContaining({ sessionId: draft.id, status: "draft" })]);
    await n.worker.runOnce();
    expect((await subjects("coach@signalclub.test")).filter((s) => s.startsWith("Plan to change: Ben"))).toHaveLength(
      1,
    );
    expect((await subjects("ben@signalclub.test")).filter((s) => s.includes("medical staff"))).toEqual([]);
    // Lifted again so the availability checks below start from a clean plan.
    await d.Restriction.update({ liftedOn: today }, { where: { athleteId: ben.athleteId!, note: "Achilles" } });
    await draft.destroy();
  });

  it("the coach plans it anyway with a reason: no longer a conflict, and the athlete's mail names the restriction", async () => {
    as(coach.userId);
    const current = (await d.PlannedSession.findByPk(flys.id))!;
    const refused = await json(
      await session.PATCH(
        send(`/api/sessions/${flys.id}`, "PATCH", { version: current.version, startTime: "17:00" }),
        p({ sessionId: String(flys.id) }),
      ),
    );
    // Editing a session that already broke the restriction is not asked again (the guard counts new breaches).
    expect(refused.status).toBe(200);
    expect(await medicalChangesFor({ teamId: team.teamId, athleteId: ada.athleteId!, from: today })).toHaveProperty(
      "size",
      1,
    );
    // Moving the easy Tuesday session's day into the restriction with flys asks, and goes through with a reason.
    const other = await published(ada.athleteId!, mon, "strength", "Gym", null);
    const moved = await json(
      await session.PATCH(
        send(`/api/sessions/${other.id}`, "PATCH", {
          version: other.version,
          title: "Flys after all",
          blocks: [
            {
              kind: "max_velocity",
              title: "Flying 20s",
              running: { ...flysRunning, distanceM: 20 },
              drills: null,
              notes: "",
            },
          ],
          override: { reason: "Cleared by the physio for 20 m" },
        }),
        p({ sessionId: String(other.id) }),
      ),
    );
    expect(moved.status).toBe(200);
    const marked = await medicalChangesFor({ teamId: team.teamId, athleteId: ada.athleteId!, from: today });
    expect(marked.has(other.id)).toBe(false);
    await n.worker.runOnce();
    const changed = (await n.mailTo("ada@signalclub.test")).filter((m) =>
      m.subject.startsWith("Changed: Flys after all"),
    );
    expect(changed).toHaveLength(1);
    expect(changed[0]!.text).toContain("planned past a restriction from your medical staff");
    expect(changed[0]!.text).toContain("No max velocity");
    expect(changed[0]!.text).toContain("Cleared by the physio for 20 m");
  });
});

describe("availability, set by the physio, is enforced by the planner's guard like a restriction", () => {
  const setAvailability = (athleteId: number, body: unknown) =>
    availability
      .POST(send(`/api/athletes/${athleteId}/availability`, "POST", body), p({ athleteId: String(athleteId) }))
      .then(json);
  const drop = (templateId: number, date: string, override?: { reason: string }) =>
    sessions
      .POST(
        send(`/api/teams/${T}/sessions`, "POST", {
          from: "template",
          templateId,
          athleteId: ben.athleteId,
          date,
          ...(override ? { override } : {}),
        }),
        p({ teamId: T }),
      )
      .then(json);

  it("only the medical staff set it; a return date before the first day is a 400 on returnOn", async () => {
    as(coach.userId);
    expect(
      (await setAvailability(ben.athleteId!, { level: "unavailable", startsOn: today, note: "Ankle" })).status,
    ).toBe(403);
    as(physio.userId);
    const bad = await setAvailability(ben.athleteId!, {
      level: "modified",
      startsOn: wed,
      returnOn: tue,
      note: "Ankle",
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.fields).toHaveProperty("returnOn");
    const level = await setAvailability(ben.athleteId!, { level: "sideline", startsOn: wed, note: "Ankle" });
    expect(level.body.error?.fields).toHaveProperty("level");
  });

  it("unavailable: a drop asks for a reason (409 restricted); with one it is saved and the physio alerted", async () => {
    as(physio.userId);
    const set = await setAvailability(ben.athleteId!, {
      level: "unavailable",
      startsOn: today,
      returnOn: thu,
      note: "Ankle sprain",
    });
    expect(set.status).toBe(201);
    as(coach.userId);
    const refused = await drop(strength.id, tue);
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("restricted");
    expect(refused.body.error?.message).toMatch(/No training/);
    // The return date is the first day back: Thursday is free again.
    expect((await drop(strength.id, thu)).status).toBe(201);
    const saved = await drop(strength.id, tue, { reason: "Upper body only, agreed with the physio" });
    expect(saved.status).toBe(201);
    const alerts = await listAlerts({
      teamId: team.teamId,
      userId: physio.userId,
      query: { status: "unresolved", limit: 50, athleteId: ben.athleteId! },
    });
    expect(alerts.filter((a) => a.kind === "restriction_override")).toHaveLength(1);
  });

  it("modified: near-max running asks, strength does not; back to full training frees the plan", async () => {
    as(physio.userId);
    expect(
      (await setAvailability(ben.athleteId!, { level: "modified", startsOn: today, note: "Easing back in" })).status,
    ).toBe(201);
    as(coach.userId);
    // The unavailable level was lifted from today: strength goes through again.
    expect((await drop(strength.id, wed)).status).toBe(201);
    const flysDrop = await drop(flysTemplate.id, wed);
    expect(flysDrop.status).toBe(409);
    expect(flysDrop.body.error?.message).toMatch(/at most 85% of vmax/);
    as(physio.userId);
    expect((await setAvailability(ben.athleteId!, { level: "full", startsOn: today })).status).toBe(201);
    as(coach.userId);
    expect((await drop(flysTemplate.id, wed)).status).toBe(201);
  });
});
