// How the matrix asks each question: for every row of authz-expected.ts, the request a caller sends. Targets
// are fresh for every cell that writes, so one caller's success never changes what the next caller sees.
import type { Subject, World } from "./authz-fixtures";
import { STRENGTH_BLOCK } from "./authz-fixtures";

export type Req =
  | { kind: "api"; method: string; path: string; body?: unknown }
  | { kind: "page"; path: string }
  | { kind: "action"; args: unknown[] };

type Build = (w: World, s: Subject) => Promise<Req>;
const api = (method: string, path: string, body?: unknown): Req => ({ kind: "api", method, path, body });
const page = (path: string): Req => ({ kind: "page", path });
const action = (...args: unknown[]): Req => ({ kind: "action", args });

const athlete = (w: World, s: Subject) => w.target(s).id;
const template = { ...STRENGTH_BLOCK, title: "Matrix template (edited)", durationMin: 30, plannedRpe: 4 };
const farWeek = "2027-11-15"; // an empty week: the week tools change nothing else the matrix reads
const athleteForm = {
  name: "Jonah Pell",
  groupId: null,
  sex: "male",
  birthDate: "2000-09-03",
  bodyMassKg: 78.2,
  vmaxMs: 10.86,
  vmaxTestedOn: null,
  tauS: 1.24,
  stepLengthM: 2.46,
  plyoLevel: "advanced",
};

/** A fresh open invitation to team A, written straight to the table (nobody accepted it). */
async function openInvitation(w: World): Promise<number> {
  const now = new Date().toISOString().replace("T", " ").replace("Z", " +00:00");
  const email = `invited-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}@elsewhere.test`;
  await w.app.query(
    "INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, 'Invited', NULL, ?, ?)",
    [email, now, now],
  );
  const [user] = await w.app.query<{ id: number }>("SELECT id FROM users WHERE email = ?", [email]);
  await w.app.query(
    "INSERT INTO invitations (team_id, user_id, purpose, email, role, token_hash, expires_at, used_at, created_at, updated_at) " +
      "VALUES (?, ?, 'invite', ?, 'coach', ?, '2099-01-01 00:00:00.000 +00:00', NULL, ?, ?)",
    [w.teamId, user.id, email, `matrix-${email}`, now, now],
  );
  const [row] = await w.app.query<{ id: number }>("SELECT id FROM invitations WHERE email = ?", [email]);
  return row.id;
}

export const REQUESTS: Record<string, Build> = {
  "GET /api/alerts": async () => api("GET", "/api/alerts"),
  "GET /api/alerts/[alertId]": async (w, s) => api("GET", `/api/alerts/${await w.alert(athlete(w, s))}`),
  "PATCH /api/alerts/[alertId]": async (w, s) =>
    api("PATCH", `/api/alerts/${await w.alert(athlete(w, s))}`, { action: "acknowledge" }),
  "POST /api/alerts/seen": async () => api("POST", "/api/alerts/seen"),
  "GET /api/athletes/[athleteId]/calendar-token": async (w, s) =>
    api("GET", `/api/athletes/${athlete(w, s)}/calendar-token`),
  "POST /api/athletes/[athleteId]/calendar-token": async (w, s) =>
    api("POST", `/api/athletes/${athlete(w, s)}/calendar-token`),
  "DELETE /api/athletes/[athleteId]/calendar-token": async (w, s) =>
    api("DELETE", `/api/athletes/${athlete(w, s)}/calendar-token`),
  // Full training: the matrix checks who may set it without putting a restriction on anyone's plan.
  "POST /api/athletes/[athleteId]/availability": async (w, s) =>
    api("POST", `/api/athletes/${athlete(w, s)}/availability`, { level: "full", startsOn: w.today(), note: "Matrix" }),
  "GET /api/athletes/[athleteId]/check-ins": async (w, s) => api("GET", `/api/athletes/${athlete(w, s)}/check-ins`),
  "PUT /api/athletes/[athleteId]/check-ins": async (w, s) =>
    api("PUT", `/api/athletes/${athlete(w, s)}/check-ins`, { sleep: 4, fatigue: 3, soreness: 3, stress: 4, mood: 4 }),
  "GET /api/athletes/[athleteId]/load": async (w, s) => api("GET", `/api/athletes/${athlete(w, s)}/load`),
  "GET /api/athletes/[athleteId]/restrictions": async (w, s) =>
    api("GET", `/api/athletes/${athlete(w, s)}/restrictions`),
  "POST /api/athletes/[athleteId]/restrictions": async (w, s) =>
    api("POST", `/api/athletes/${athlete(w, s)}/restrictions`, {
      rule: "contact_cap",
      maxContacts: 450,
      startsOn: w.today(),
      endsOn: null,
      note: "Matrix check",
    }),
  "GET /api/auth/[...nextauth]": async () => api("GET", "/api/auth/session"),
  // Without the CSRF token next-auth only points at its confirmation page; nobody is signed out.
  "POST /api/auth/[...nextauth]": async () => api("POST", "/api/auth/signout"),
  // The long random token in the URL is the credential (calendar apps cannot sign in).
  "GET /api/calendar/[token]": async (w, s) => api("GET", await w.feedPath(athlete(w, s))),
  "GET /api/health": async () => api("GET", "/api/health"),
  "POST /api/load/preview": async (w, s) =>
    api("POST", "/api/load/preview", {
      teamId: w.teamId,
      athleteId: athlete(w, s),
      week: w.today(),
      sessions: [{ date: w.today(), durationMin: 40, plannedRpe: 5, blocks: [STRENGTH_BLOCK] }],
    }),
  "GET /api/mailbox": async (w) => {
    await Promise.all([w.mail(w.athletes.maya.email), w.mail(w.athletes.jonah.email)]);
    return api("GET", "/api/mailbox");
  },
  "DELETE /api/mailbox": async () => api("DELETE", "/api/mailbox"),
  "GET /api/mailbox/[mailId]": async (w, s) => api("GET", `/api/mailbox/${await w.mail(w.target(s).email)}`),
  "GET /api/mailbox/[mailId]/attachments/[index]": async (w, s) =>
    api("GET", `/api/mailbox/${await w.mail(w.target(s).email)}/attachments/0`),
  "GET /api/mailbox/[mailId]/raw": async (w, s) => api("GET", `/api/mailbox/${await w.mail(w.target(s).email)}/raw`),
  "GET /api/me/notification-settings": async () => api("GET", "/api/me/notification-settings"),
  "PUT /api/me/notification-settings": async () =>
    api("PUT", "/api/me/notification-settings", { alertEmail: "digest" }),
  "PATCH /api/restrictions/[restrictionId]": async (w, s) =>
    api("PATCH", `/api/restrictions/${await w.restriction(athlete(w, s))}`, { action: "lift" }),
  "GET /api/sessions/[sessionId]": async (w, s) => api("GET", `/api/sessions/${(await w.session(athlete(w, s))).id}`),
  "PATCH /api/sessions/[sessionId]": async (w, s) => {
    const { id, version } = await w.session(athlete(w, s));
    return api("PATCH", `/api/sessions/${id}`, { version, title: "Matrix session (moved)" });
  },
  "DELETE /api/sessions/[sessionId]": async (w, s) => {
    const { id, version } = await w.session(athlete(w, s));
    return api("DELETE", `/api/sessions/${id}?version=${version}`);
  },
  "POST /api/sessions/[sessionId]/blocks": async (w, s) => {
    const { id, version } = await w.session(athlete(w, s));
    return api("POST", `/api/sessions/${id}/blocks`, { version, block: STRENGTH_BLOCK });
  },
  "PATCH /api/sessions/[sessionId]/blocks/[blockId]": async (w, s) => {
    const { id, version, blockId } = await w.session(athlete(w, s));
    return api("PATCH", `/api/sessions/${id}/blocks/${blockId}`, {
      version,
      block: { ...STRENGTH_BLOCK, title: "Split squats" },
    });
  },
  "DELETE /api/sessions/[sessionId]/blocks/[blockId]": async (w, s) => {
    const { id, version, blockId } = await w.session(athlete(w, s));
    return api("DELETE", `/api/sessions/${id}/blocks/${blockId}?version=${version}`);
  },
  "GET /api/sessions/[sessionId]/messages": async (w, s) =>
    api("GET", `/api/sessions/${(await w.session(athlete(w, s))).id}/messages`),
  "POST /api/sessions/[sessionId]/messages": async (w, s) =>
    api("POST", `/api/sessions/${(await w.session(athlete(w, s))).id}/messages`, { body: "Matrix message" }),
  "GET /api/sessions/[sessionId]/log": async (w, s) =>
    api("GET", `/api/sessions/${(await w.session(athlete(w, s))).id}/log`),
  "POST /api/sessions/[sessionId]/log/unlock": async (w, s) =>
    api("POST", `/api/sessions/${(await w.session(athlete(w, s))).id}/log/unlock`),
  "PUT /api/sessions/[sessionId]/log": async (w, s) =>
    api("PUT", `/api/sessions/${(await w.session(athlete(w, s))).id}/log`, { completion: "yes", rpe: 6, minutes: 45 }),
  "DELETE /api/sessions/[sessionId]/log": async (w, s) => {
    const { id } = await w.session(athlete(w, s));
    const logged = await w.as("head", "PUT", `/api/sessions/${id}/log`, { completion: "partly", rpe: 5, minutes: 30 });
    if (logged.status !== 200) throw new Error(`fixture log answered ${logged.status}`);
    return api("DELETE", `/api/sessions/${id}/log`);
  },
  "GET /api/teams/[teamId]/athlete-reports": async (w) => api("GET", `/api/teams/${w.teamId}/athlete-reports`),
  // The demo club's own line: the matrix checks who may ask without changing when the physio is alerted.
  "PATCH /api/teams/[teamId]/athlete-reports": async (w) =>
    api("PATCH", `/api/teams/${w.teamId}/athlete-reports`, { painAlertAbove: 3 }),
  "GET /api/teams/[teamId]/load": async (w) => api("GET", `/api/teams/${w.teamId}/load`),
  "GET /api/teams/[teamId]/plan-vs-actual": async (w) => api("GET", `/api/teams/${w.teamId}/plan-vs-actual`),
  "GET /api/teams/[teamId]/plan": async (w) => api("GET", `/api/teams/${w.teamId}/plan`),
  "POST /api/teams/[teamId]/plan/[tool]": async (w) =>
    api("POST", `/api/teams/${w.teamId}/plan/publish`, { week: farWeek }),
  "POST /api/teams/[teamId]/speed/tests/[testId]/accept": async (w, s) =>
    api("POST", `/api/teams/${w.teamId}/speed/tests/${await w.speedTest(athlete(w, s))}/accept`),
  "POST /api/teams/[teamId]/speed/measure-uploads": async (w, s) =>
    api("POST", `/api/teams/${w.teamId}/speed/measure-uploads`, {
      kind: "contacts",
      fileName: "matrix-contacts.csv",
      content: "contact_time_s,flight_time_s\n0.1,0.12\n",
      athleteId: athlete(w, s),
      testDate: "2020-01-01",
    }),
  "PATCH /api/teams/[teamId]/speed/settings": async (w) =>
    api("PATCH", `/api/teams/${w.teamId}/speed/settings`, { retestWeeks: 6 }),
  "POST /api/teams/[teamId]/speed/timing-uploads": async (w, s) =>
    api("POST", `/api/teams/${w.teamId}/speed/timing-uploads`, {
      fileName: "matrix.csv",
      content: `athlete,date,start,distance_m,time_s\n${await w.athleteName(athlete(w, s))},2020-01-01,standing,10,1.969\n`,
    }),
  "POST /api/teams/[teamId]/sessions": async (w, s) =>
    api("POST", `/api/teams/${w.teamId}/sessions`, {
      from: "blank",
      athleteId: athlete(w, s),
      date: farWeek,
      durationMin: 40,
      title: "Matrix new session",
      plannedRpe: 4,
      notes: null,
      blocks: [],
    }),
  "GET /api/teams/[teamId]/season": async (w) => api("GET", `/api/teams/${w.teamId}/season?weeks=2`),
  "GET /api/teams/[teamId]/season/export": async (w) => api("GET", `/api/teams/${w.teamId}/season/export?weeks=2`),
  "POST /api/teams/[teamId]/season/phases": async (w) => {
    const startsOn = w.farMonday();
    return api("POST", `/api/teams/${w.teamId}/season/phases`, {
      kind: "taper",
      name: "Matrix taper",
      startsOn,
      endsOn: startsOn,
    });
  },
  "POST /api/teams/[teamId]/season/meets": async (w) =>
    api("POST", `/api/teams/${w.teamId}/season/meets`, { name: "Matrix meet", date: w.farMonday(), priority: "C" }),
  "GET /api/teams/[teamId]/season/progression": async (w) =>
    api(
      "GET",
      `/api/teams/${w.teamId}/season/progression?sourceWeek=${farWeek}&firstWeek=${w.farMonday()}&to=${w.farMonday()}`,
    ),
  // An empty source week: the generator has nothing to copy, so nothing else the matrix reads changes.
  "POST /api/teams/[teamId]/season/progression": async (w) =>
    api("POST", `/api/teams/${w.teamId}/season/progression`, {
      sourceWeek: farWeek,
      firstWeek: w.farMonday(),
      weeks: 2,
      rule: { kind: "taper", reductionPct: 40, shape: "linear" },
    }),
  "PATCH /api/season-phases/[phaseId]": async (w) => {
    const { id, startsOn, endsOn } = await w.phase();
    return api("PATCH", `/api/season-phases/${id}`, {
      kind: "transition",
      name: "Matrix rest",
      startsOn,
      endsOn,
      version: 1,
    });
  },
  "DELETE /api/season-phases/[phaseId]": async (w) => api("DELETE", `/api/season-phases/${(await w.phase()).id}`),
  "POST /api/season-phases/[phaseId]/copy": async (w) =>
    api("POST", `/api/season-phases/${(await w.phase()).id}/copy`, { weeksLater: 1 }),
  "PATCH /api/meets/[meetId]": async (w) =>
    api("PATCH", `/api/meets/${await w.meet()}`, { name: "Matrix meet (moved)", date: w.farMonday(), priority: "B" }),
  "DELETE /api/meets/[meetId]": async (w) => api("DELETE", `/api/meets/${await w.meet()}`),
  "GET /api/teams/[teamId]/settings": async (w) => api("GET", `/api/teams/${w.teamId}/settings`),
  "PATCH /api/teams/[teamId]/settings": async (w) =>
    api("PATCH", `/api/teams/${w.teamId}/settings`, { recoveryHours: 48 }),
  // Monday is the demo club's own week start: the matrix checks who may ask without changing anyone's weeks.
  "PATCH /api/teams/[teamId]/week-start": async (w) =>
    api("PATCH", `/api/teams/${w.teamId}/week-start`, { weekStartDay: 1 }),
  "GET /api/teams/[teamId]/templates": async (w) => api("GET", `/api/teams/${w.teamId}/templates`),
  "POST /api/teams/[teamId]/templates": async (w) => api("POST", `/api/teams/${w.teamId}/templates`, template),
  "GET /api/templates/[templateId]": async (w) => api("GET", `/api/templates/${await w.template()}`),
  "PUT /api/templates/[templateId]": async (w) =>
    api("PUT", `/api/templates/${await w.template()}`, { ...template, version: 1 }),
  "DELETE /api/templates/[templateId]": async (w) => api("DELETE", `/api/templates/${await w.template()}`),

  "PAGE /": async () => page("/"),
  "PAGE /forgot-password": async () => page("/forgot-password"),
  "PAGE /invite/[token]": async () => page("/invite/no-such-invitation-token-0123456789"),
  "PAGE /sign-in": async () => page("/sign-in"),
  "PAGE /alerts": async () => page("/alerts"),
  "PAGE /figures": async () => page("/figures"),
  "PAGE /home": async () => page("/home"),
  "PAGE /load": async () => page("/load"),
  "PAGE /load/[athleteId]": async (w, s) => page(`/load/${athlete(w, s)}`),
  "PAGE /mailbox": async () => page("/mailbox"),
  "PAGE /mailbox/[mailId]": async (w, s) => page(`/mailbox/${await w.mail(w.target(s).email)}`),
  "PAGE /me": async () => page("/me"),
  "PAGE /me/load": async () => page("/me/load"),
  "PAGE /members": async () => page("/members"),
  "PAGE /not-allowed": async () => page("/not-allowed"),
  "PAGE /plan": async () => page("/plan"),
  "PAGE /plan-vs-actual": async () => page("/plan-vs-actual"),
  "PAGE /season": async () => page("/season"),
  "PAGE /settings": async () => page("/settings"),
  "PAGE /speed": async () => page("/speed"),
  "PAGE /speed/[athleteId]": async (w, s) => page(`/speed/${athlete(w, s)}`),
  "PAGE /squad": async () => page("/squad"),
  "PAGE /squad/[athleteId]": async (w, s) => page(`/squad/${athlete(w, s)}`),
  "PAGE /squad/new": async () => page("/squad/new"),
  "PAGE /status": async () => page("/status"),
  "PAGE /status/[athleteId]": async (w, s) => page(`/status/${athlete(w, s)}`),

  "ACTION /forgot-password#forgotPasswordAction": async () => action({ email: "nobody-here@nowhere.test" }),
  "ACTION /invite#joinTeamAction": async () => action({ token: "no-such-invitation-token-0123456789" }),
  "ACTION /invite#setPasswordAction": async () =>
    action({
      token: "no-such-invitation-token-0123456789",
      password: "a long enough passphrase 77",
      confirm: "a long enough passphrase 77",
    }),
  "ACTION /members#addMemberAction": async () =>
    action({
      name: "Matrix Newcomer",
      email: `new-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}@elsewhere.test`,
      role: "coach",
    }),
  "ACTION /members#changeRoleAction": async (w) => action(await w.membership(), { role: "physio" }),
  "ACTION /members#removeMemberAction": async (w) => action(await w.membership()),
  "ACTION /members#withdrawInvitationAction": async (w) => action(await openInvitation(w)),
  "ACTION /squad#saveAthleteAction": async (w, s) => action(athlete(w, s), athleteForm),
};
