import type { z } from "zod";
import type { updateAlertStatus } from "@/lib/data/alerts";
import type { getCalendarFeedStatus, revokeCalendarToken, rotateCalendarToken } from "@/lib/data/calendar-tokens";
import type { updateNotificationSettings } from "@/lib/data/notification-settings";
import type { updateTeamWeekStart } from "@/lib/data/team-settings";
import type { createTemplate, updateTemplate } from "@/lib/data/templates";
import type { PlausibilityCheck } from "@/lib/plan/plausibility";
import type { PlanSession } from "@/lib/plan/types";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import type { withWeekRows } from "@/lib/data/plan";
import type { clearWeek, copyWeekToNext, publishWeek } from "@/lib/services/plan-week";
import type { createRestriction, liftRestriction } from "@/lib/services/restrictions";
import type { saveSessionLog } from "@/lib/services/session-logs";
import type { updateTeamLoadSettings } from "@/lib/services/team-settings";
import type { AthleteReportSettings } from "@/lib/data/athlete-report-settings";
import type { CheckInDto } from "@/lib/data/check-ins";
import type { alertActionSchema } from "@/lib/validations/alerts";
import type { athleteReportSettingsSchema, checkInSchema } from "@/lib/validations/athlete-reports";
import type { sessionLogSchema } from "@/lib/validations/log";
import type { notificationSettingsSchema } from "@/lib/validations/notifications";
import type { addBlockSchema, createSessionSchema, updateSessionSchema, weekToolSchema } from "@/lib/validations/plan";
import type { createRestrictionSchema, restrictionActionSchema } from "@/lib/validations/restrictions";
import type { teamSettingsPatchSchema } from "@/lib/validations/team-settings";
import type { teamWeekSchema } from "@/lib/validations/team-week";
import type { templateSchema, updateTemplateSchema } from "@/lib/validations/template";
import type { SeasonMeet, SeasonPhase } from "@/lib/data/season";
import type { ProgressionResult } from "@/lib/services/season";
import type { copyPhaseSchema, meetInputSchema, phaseInputSchema, progressionSchema } from "@/lib/validations/season";
import { sendJson, type ApiError } from "./fetcher";
import type { Availability } from "@/lib/availability/levels";
import type { SessionMessageDto } from "@/lib/data/session-messages";
import type { SessionConflict } from "@/lib/restrictions/conflicts";
import type { availabilitySchema } from "@/lib/validations/availability";
import type { sessionMessageSchema } from "@/lib/validations/session-messages";
import { athleteReportKeys, loadKeys, medicalKeys, noticeKeys, planKeys, restrictionKeys, seasonKeys } from "./keys";

// Every write the browser sends, each body typed from the schema its handler parses (z.input: before coercion),
// each answer from what the lib/ function behind its handler returns (as JSON: Dates arrive as strings), so a
// change on the server side breaks the caller at compile time. The wrappers ({ template }, { log }…) are the
// handlers' own.
type Body<S extends z.ZodType> = z.input<S>;
type Returned<F extends (...args: never[]) => Promise<unknown>> = Awaited<ReturnType<F>>;
/** A session or block write: the service's result with the server's week rows (answer(), session-access.ts). */
type SessionWrite = Returned<typeof withWeekRows>;

export const planApi = {
  createSession: (teamId: number, body: Body<typeof createSessionSchema>) =>
    sendJson<SessionWrite>("POST", planKeys.teamSessions(teamId), body),
  updateSession: (sessionId: number, body: Body<typeof updateSessionSchema>) =>
    sendJson<SessionWrite>("PATCH", planKeys.session(sessionId), body),
  deleteSession: (sessionId: number, version: number) =>
    sendJson<SessionWrite>("DELETE", `${planKeys.session(sessionId)}?version=${version}`),
  addBlock: (sessionId: number, body: Body<typeof addBlockSchema>) =>
    sendJson<SessionWrite>("POST", planKeys.sessionBlocks(sessionId), body),
  removeBlock: (sessionId: number, blockId: number, version: number) =>
    sendJson<SessionWrite>("DELETE", `${planKeys.sessionBlock(sessionId, blockId)}?version=${version}`),
  weekTool: (teamId: number, tool: "copy-to-next" | "clear" | "publish", body: Body<typeof weekToolSchema>) =>
    sendJson<Returned<typeof copyWeekToNext | typeof clearWeek | typeof publishWeek>>(
      "POST",
      planKeys.weekTool(teamId, tool),
      body,
    ),
  createTemplate: (teamId: number, body: Body<typeof templateSchema>) =>
    sendJson<{ template: Returned<typeof createTemplate> }>("POST", planKeys.teamTemplates(teamId), body),
  updateTemplate: (templateId: number, body: Body<typeof updateTemplateSchema>) =>
    sendJson<{ template: Returned<typeof updateTemplate> }>("PUT", planKeys.template(templateId), body),
  deleteTemplate: (templateId: number) => sendJson<{ deleted: true }>("DELETE", planKeys.template(templateId)),
  saveLog: (sessionId: number, body: Body<typeof sessionLogSchema>) =>
    sendJson<{ log: Returned<typeof saveSessionLog> }>("PUT", planKeys.sessionLog(sessionId), body),
};

/** On 409 "stale": the session (or template) as it now is on the server. */
export const currentOf = (e: ApiError) => (e.details.current as PlanSession | undefined) ?? null;
/** On 409 "restricted": what the change would break. */
export const hitsOf = (e: ApiError) => (e.details.hits as RestrictionHit[] | undefined) ?? [];
/** On 422 "implausible": the plausibility limits the change goes past, with the numbers. */
export const checksOf = (e: ApiError) => (e.details.checks as PlausibilityCheck[] | undefined) ?? [];

export const loadApi = {
  saveSettings: (teamId: number, body: Body<typeof teamSettingsPatchSchema>) =>
    sendJson<{ settings: Returned<typeof updateTeamLoadSettings> }>("PATCH", loadKeys.teamSettings(teamId), body),
  saveWeekStart: (teamId: number, body: Body<typeof teamWeekSchema>) =>
    sendJson<Returned<typeof updateTeamWeekStart>>("PATCH", loadKeys.teamWeekStart(teamId), body),
};

type FeedStatus = Returned<typeof getCalendarFeedStatus>;

export const noticeApi = {
  act: (alertId: number, body: Body<typeof alertActionSchema>) =>
    sendJson<{ alert: Returned<typeof updateAlertStatus> }>("PATCH", noticeKeys.alert(alertId), body),
  markSeen: () => sendJson<{ unread: number }>("POST", noticeKeys.alertsSeen),
  saveSettings: (body: Body<typeof notificationSettingsSchema>) =>
    sendJson<Returned<typeof updateNotificationSettings>>("PUT", noticeKeys.notificationSettings, body),
  // The handler leaves the token out of its answer.
  newCalendarLink: (athleteId: number) =>
    sendJson<Omit<Returned<typeof rotateCalendarToken>, "token">>("POST", noticeKeys.calendarToken(athleteId)),
  stopCalendarLink: (athleteId: number) =>
    sendJson<FeedStatus & { revoked: Returned<typeof revokeCalendarToken> }>(
      "DELETE",
      noticeKeys.calendarToken(athleteId),
    ),
};

export const restrictionApi = {
  create: (athleteId: number, body: Body<typeof createRestrictionSchema>) =>
    sendJson<Returned<typeof createRestriction>>("POST", restrictionKeys.athlete(athleteId), body),
  act: (restrictionId: number, body: Body<typeof restrictionActionSchema>) =>
    sendJson<{ restriction: Returned<typeof liftRestriction> }>(
      "PATCH",
      restrictionKeys.restriction(restrictionId),
      body,
    ),
};

export const medicalApi = {
  setAvailability: (athleteId: number, body: Body<typeof availabilitySchema>) =>
    sendJson<{ availability: Availability; conflicts: SessionConflict[] }>(
      "POST",
      medicalKeys.availability(athleteId),
      body,
    ),
  postMessage: (sessionId: number, body: Body<typeof sessionMessageSchema>) =>
    sendJson<{ messages: SessionMessageDto[] }>("POST", medicalKeys.thread(sessionId), body),
};

export const seasonApi = {
  createPhase: (teamId: number, body: Body<typeof phaseInputSchema>) =>
    sendJson<{ phase: SeasonPhase }>("POST", seasonKeys.phases(teamId), body),
  deletePhase: (phaseId: number) => sendJson<{ ok: true }>("DELETE", seasonKeys.phase(phaseId)),
  copyPhase: (phaseId: number, body: Body<typeof copyPhaseSchema>) =>
    sendJson<{ phase: SeasonPhase; sessionsCopied: number }>("POST", seasonKeys.copyPhase(phaseId), body),
  createMeet: (teamId: number, body: Body<typeof meetInputSchema>) =>
    sendJson<{ meet: SeasonMeet }>("POST", seasonKeys.meets(teamId), body),
  generate: (teamId: number, body: Body<typeof progressionSchema>) =>
    sendJson<ProgressionResult>("POST", seasonKeys.progression(teamId), body),
};

export const athleteReportApi = {
  saveCheckIn: (athleteId: number, body: Body<typeof checkInSchema>) =>
    sendJson<{ checkIn: CheckInDto }>("PUT", athleteReportKeys.checkIns(athleteId), body),
  unlockLog: (sessionId: number) =>
    sendJson<{ lock: { locked: boolean; locksAt: string } }>("POST", athleteReportKeys.unlockLog(sessionId)),
  saveSettings: (teamId: number, body: Body<typeof athleteReportSettingsSchema>) =>
    sendJson<{ settings: AthleteReportSettings }>("PATCH", athleteReportKeys.teamSettings(teamId), body),
};
