// The authorization matrix: what each kind of caller must get from every route handler, page and server
// action. One row each; tests/e2e/authz-matrix.test.ts fails when a handler, page or action exists without a row
// (or a row names one that no longer exists). Requests are built in authz-requests.ts.
//
// Columns: signed out · athlete on their own data · the same athlete on another athlete's data · physio ·
// coach · head coach · head coach of another team. Team A is the demo club; every id in a request is team A's.
// Handlers: the HTTP status. Pages: ok | sign-in | not-allowed | not-found | redirect:<path>.
// Server actions (called over HTTP like the browser does): ok | sign-in | refused (bad token) | 401 | 403 | 404.
import type { Subject } from "./authz-fixtures";

export type Answer = number | "ok" | "sign-in" | "not-allowed" | "not-found" | "refused" | `redirect:${string}`;
type Line = [
  key: string,
  anon: Answer,
  own: Answer,
  other: Answer,
  physio: Answer,
  coach: Answer,
  head: Answer,
  outsider: Answer,
];

// prettier-ignore
const TABLE: Line[] = [
  //                                                  anon   own    other  physio coach  head   outsider
  ["GET /api/alerts",                                  401,   403,   403,   200,   200,   200,   200],
  ["GET /api/alerts/[alertId]",                        401,   403,   403,   200,   200,   200,   404],
  ["PATCH /api/alerts/[alertId]",                      401,   403,   403,   200,   200,   200,   404],
  ["POST /api/alerts/seen",                            401,   403,   403,   200,   200,   200,   200],
  ["GET /api/athletes/[athleteId]/calendar-token",     401,   200,   404,   403,   200,   200,   404],
  ["POST /api/athletes/[athleteId]/calendar-token",    401,   201,   404,   403,   201,   201,   404],
  ["DELETE /api/athletes/[athleteId]/calendar-token",  401,   200,   404,   403,   200,   200,   404],
  ["POST /api/athletes/[athleteId]/availability",      401,   403,   403,   201,   403,   403,   404],
  ["GET /api/athletes/[athleteId]/check-ins",          401,   200,   404,   200,   200,   200,   404],
  ["PUT /api/athletes/[athleteId]/check-ins",          401,   200,   404,   403,   403,   403,   404],
  ["GET /api/athletes/[athleteId]/load",               401,   200,   404,   200,   200,   200,   404],
  ["GET /api/athletes/[athleteId]/restrictions",       401,   200,   404,   200,   200,   200,   404],
  ["POST /api/athletes/[athleteId]/restrictions",      401,   403,   403,   201,   403,   403,   404],
  ["GET /api/auth/[...nextauth]",                      200,   200,   200,   200,   200,   200,   200],
  ["POST /api/auth/[...nextauth]",                     302,   302,   302,   302,   302,   302,   302],
  ["GET /api/calendar/[token]",                        200,   200,   200,   200,   200,   200,   200],
  ["GET /api/health",                                  200,   200,   200,   200,   200,   200,   200],
  ["POST /api/load/preview",                           401,   403,   403,   403,   200,   200,   404],
  ["GET /api/mailbox",                                 401,   200,   200,   200,   200,   200,   200],
  ["DELETE /api/mailbox",                              401,   200,   200,   200,   200,   200,   200],
  ["GET /api/mailbox/[mailId]",                        401,   200,   404,   404,   404,   404,   404],
  ["GET /api/mailbox/[mailId]/attachments/[index]",    401,   200,   404,   404,   404,   404,   404],
  ["GET /api/mailbox/[mailId]/raw",                    401,   200,   404,   404,   404,   404,   404],
  ["PATCH /api/meets/[meetId]",                        401,   403,   403,   403,   200,   200,   404],
  ["DELETE /api/meets/[meetId]",                       401,   403,   403,   403,   200,   200,   404],
  ["GET /api/me/notification-settings",                401,   403,   403,   200,   200,   200,   200],
  ["PUT /api/me/notification-settings",                401,   403,   403,   200,   200,   200,   200],
  ["PATCH /api/restrictions/[restrictionId]",          401,   403,   403,   200,   403,   403,   404],
  ["PATCH /api/season-phases/[phaseId]",               401,   403,   403,   403,   200,   200,   404],
  ["DELETE /api/season-phases/[phaseId]",              401,   403,   403,   403,   200,   200,   404],
  ["POST /api/season-phases/[phaseId]/copy",           401,   403,   403,   403,   201,   201,   404],
  ["GET /api/sessions/[sessionId]",                    401,   200,   404,   200,   200,   200,   404],
  ["PATCH /api/sessions/[sessionId]",                  401,   403,   403,   403,   200,   200,   404],
  ["DELETE /api/sessions/[sessionId]",                 401,   403,   403,   403,   200,   200,   404],
  ["POST /api/sessions/[sessionId]/blocks",            401,   403,   403,   403,   201,   201,   404],
  ["PATCH /api/sessions/[sessionId]/blocks/[blockId]", 401,   403,   403,   403,   200,   200,   404],
  ["DELETE /api/sessions/[sessionId]/blocks/[blockId]",401,   403,   403,   403,   200,   200,   404],
  ["GET /api/sessions/[sessionId]/messages",           401,   200,   404,   200,   200,   200,   404],
  ["POST /api/sessions/[sessionId]/messages",          401,   201,   404,   201,   201,   201,   404],
  ["GET /api/sessions/[sessionId]/log",                401,   200,   404,   200,   200,   200,   404],
  ["PUT /api/sessions/[sessionId]/log",                401,   200,   404,   403,   200,   200,   404],
  ["DELETE /api/sessions/[sessionId]/log",             401,   200,   404,   403,   200,   200,   404],
  ["POST /api/sessions/[sessionId]/log/unlock",        401,   403,   403,   403,   200,   200,   404],
  ["GET /api/teams/[teamId]/athlete-reports",          401,   200,   200,   200,   200,   200,   404],
  ["PATCH /api/teams/[teamId]/athlete-reports",        401,   403,   403,   403,   403,   200,   404],
  ["GET /api/teams/[teamId]/load",                     401,   403,   403,   200,   200,   200,   404],
  ["GET /api/teams/[teamId]/plan-vs-actual",           401,   403,   403,   200,   200,   200,   404],
  ["GET /api/teams/[teamId]/plan",                     401,   200,   200,   200,   200,   200,   404],
  ["POST /api/teams/[teamId]/plan/[tool]",             401,   403,   403,   403,   200,   200,   404],
  ["POST /api/teams/[teamId]/sessions",                401,   403,   403,   403,   201,   201,   404],
  ["POST /api/teams/[teamId]/speed/tests/[testId]/accept",401, 403, 403,   403,   200,   200,   404],
  ["POST /api/teams/[teamId]/speed/measure-uploads",   401,   403,   403,   403,   201,   201,   404],
  ["PATCH /api/teams/[teamId]/speed/settings",         401,   403,   403,   403,   200,   200,   404],
  ["POST /api/teams/[teamId]/speed/timing-uploads",    401,   403,   403,   403,   201,   201,   404],
  ["GET /api/teams/[teamId]/season",                   401,   403,   403,   200,   200,   200,   404],
  ["GET /api/teams/[teamId]/season/export",            401,   403,   403,   200,   200,   200,   404],
  ["POST /api/teams/[teamId]/season/meets",            401,   403,   403,   403,   201,   201,   404],
  ["POST /api/teams/[teamId]/season/phases",           401,   403,   403,   403,   201,   201,   404],
  ["GET /api/teams/[teamId]/season/progression",       401,   403,   403,   403,   200,   200,   404],
  ["POST /api/teams/[teamId]/season/progression",      401,   403,   403,   403,   201,   201,   404],
  ["GET /api/teams/[teamId]/settings",                 401,   200,   200,   200,   200,   200,   404],
  ["PATCH /api/teams/[teamId]/settings",               401,   403,   403,   403,   403,   200,   404],
  ["PATCH /api/teams/[teamId]/week-start",             401,   403,   403,   403,   403,   200,   404],
  ["GET /api/teams/[teamId]/templates",                401,   403,   403,   200,   200,   200,   404],
  ["POST /api/teams/[teamId]/templates",               401,   403,   403,   403,   201,   201,   404],
  ["GET /api/templates/[templateId]",                  401,   403,   403,   200,   200,   200,   404],
  ["PUT /api/templates/[templateId]",                  401,   403,   403,   403,   200,   200,   404],
  ["DELETE /api/templates/[templateId]",               401,   403,   403,   403,   200,   200,   404],

  //                          anon       own            other          physio         coach          head           outsider
  ["PAGE /",                  "ok",      "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /forgot-password",   "ok",      "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /invite/[token]",    "ok",      "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /sign-in",           "ok",      "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /alerts",            "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /figures",           "sign-in", "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /home",              "sign-in", "redirect:/me", "redirect:/me",         "ok",          "ok",          "ok",          "ok"],
  ["PAGE /load",              "sign-in", "redirect:/load/[own]", "redirect:/load/[own]", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /load/[athleteId]",  "sign-in", "ok",          "not-found",   "ok",          "ok",          "ok",          "not-found"],
  ["PAGE /mailbox",           "sign-in", "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /mailbox/[mailId]",  "sign-in", "ok",          "not-found",   "not-found",   "not-found",   "not-found",   "not-found"],
  ["PAGE /me",                "sign-in", "ok",          "ok",          "not-allowed", "ok",          "ok",          "ok"],
  ["PAGE /me/load",           "sign-in", "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /members",           "sign-in", "not-allowed", "not-allowed", "not-allowed", "not-allowed", "ok",          "ok"],
  ["PAGE /not-allowed",       "sign-in", "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /plan-vs-actual",    "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /plan",              "sign-in", "ok",          "ok",          "ok",          "ok",          "ok",          "ok"],
  ["PAGE /season",           "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /settings",          "sign-in", "not-allowed", "not-allowed", "not-allowed", "not-allowed", "ok",          "ok"],
  ["PAGE /speed",             "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /speed/[athleteId]", "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "not-found"],
  ["PAGE /squad",             "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /squad/[athleteId]", "sign-in", "ok",          "not-found",   "ok",          "ok",          "ok",          "not-found"],
  ["PAGE /status",             "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "ok"],
  ["PAGE /status/[athleteId]", "sign-in", "not-allowed", "not-allowed", "ok",          "ok",          "ok",          "not-found"],
  ["PAGE /squad/new",         "sign-in", "not-allowed", "not-allowed", "not-allowed", "ok",          "ok",          "ok"],

  ["ACTION /forgot-password#forgotPasswordAction", "ok",      "ok",      "ok",      "ok",      "ok",      "ok",      "ok"],
  ["ACTION /invite#joinTeamAction",                401,       "refused", "refused", "refused", "refused", "refused", "refused"],
  ["ACTION /invite#setPasswordAction",             "refused", "refused", "refused", "refused", "refused", "refused", "refused"],
  ["ACTION /members#addMemberAction",              "sign-in", 403,       403,       403,       403,       "ok",      "ok"],
  ["ACTION /members#changeRoleAction",             "sign-in", 403,       403,       403,       403,       "ok",      404],
  ["ACTION /members#removeMemberAction",           "sign-in", 403,       403,       403,       403,       "ok",      404],
  ["ACTION /members#withdrawInvitationAction",     "sign-in", 403,       403,       403,       403,       "ok",      404],
  ["ACTION /squad#saveAthleteAction",              "sign-in", 403,       403,       403,       "ok",      "ok",      404],
];

/**
 * Cells where today's code gives a different answer, each naming the defect (issue #10) and whose fix it waits
 * for. The matrix runs these as expected failures, so the run turns red the day a fix lands: then delete the
 * entry.
 */
// Defect 1 (the mailbox showed every mail to every member) was fixed in 20afc2d; its cells pass as written.
export const KNOWN_DEFECTS: Record<string, Partial<Record<Subject, string>>> = {};

export const EXPECTED: Record<string, Record<Subject, Answer>> = Object.fromEntries(
  TABLE.map(([key, anon, own, other, physio, coach, head, outsider]) => [
    key,
    { anon, own, other, physio, coach, head, outsider },
  ]),
);
export const TABLE_KEYS = TABLE.map(([key]) => key);
