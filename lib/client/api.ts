import type { z } from "zod";
import type { AlertRow } from "@/lib/data/alerts";
import type { CalendarFeedStatus } from "@/lib/data/calendar-tokens";
import type { NotificationSettingsView } from "@/lib/data/notification-settings";
import type { TeamLoadSettings } from "@/lib/load/types";
import type { PlausibilityCheck } from "@/lib/plan/plausibility";
import type { PlanSession, PlanTemplate, PlanWriteResult } from "@/lib/plan/types";
import type { Restriction, RestrictionHit } from "@/lib/restrictions/rules";
import type { alertActionSchema } from "@/lib/validations/alerts";
import type { sessionLogSchema } from "@/lib/validations/log";
import type { notificationSettingsSchema } from "@/lib/validations/notifications";
import type { addBlockSchema, createSessionSchema, updateSessionSchema, weekToolSchema } from "@/lib/validations/plan";
import type { createRestrictionSchema, restrictionActionSchema } from "@/lib/validations/restrictions";
import type { teamSettingsPatchSchema } from "@/lib/validations/team-settings";
import type { teamWeekSchema } from "@/lib/validations/team-week";
import type { templateSchema, updateTemplateSchema } from "@/lib/validations/template";
import { sendJson, type ApiError } from "./fetcher";
import { loadKeys, noticeKeys, planKeys, restrictionKeys } from "./keys";

// Every write the browser sends, each body typed from the schema its handler parses (z.input: before coercion).
type Body<S extends z.ZodType> = z.input<S>;

export const planApi = {
  createSession: (teamId: number, body: Body<typeof createSessionSchema>) =>
    sendJson<PlanWriteResult>("POST", planKeys.teamSessions(teamId), body),
  updateSession: (sessionId: number, body: Body<typeof updateSessionSchema>) =>
    sendJson<PlanWriteResult>("PATCH", planKeys.session(sessionId), body),
  deleteSession: (sessionId: number, version: number) =>
    sendJson<PlanWriteResult>("DELETE", `${planKeys.session(sessionId)}?version=${version}`),
  addBlock: (sessionId: number, body: Body<typeof addBlockSchema>) =>
    sendJson<PlanWriteResult>("POST", planKeys.sessionBlocks(sessionId), body),
  removeBlock: (sessionId: number, blockId: number, version: number) =>
    sendJson<PlanWriteResult>("DELETE", `${planKeys.sessionBlock(sessionId, blockId)}?version=${version}`),
  weekTool: (teamId: number, tool: "copy-to-next" | "clear" | "publish", body: Body<typeof weekToolSchema>) =>
    sendJson<PlanWriteResult>("POST", planKeys.weekTool(teamId, tool), body),
  createTemplate: (teamId: number, body: Body<typeof templateSchema>) =>
    sendJson<{ template: PlanTemplate }>("POST", planKeys.teamTemplates(teamId), body),
  updateTemplate: (templateId: number, body: Body<typeof updateTemplateSchema>) =>
    sendJson<{ template: PlanTemplate }>("PUT", planKeys.template(templateId), body),
  deleteTemplate: (templateId: number) => sendJson<{ deleted: true }>("DELETE", planKeys.template(templateId)),
  saveLog: (sessionId: number, body: Body<typeof sessionLogSchema>) =>
    sendJson<unknown>("PUT", planKeys.sessionLog(sessionId), body),
};

/** On 409 "stale": the session (or template) as it now is on the server. */
export const currentOf = (e: ApiError) => (e.details.current as PlanSession | undefined) ?? null;
/** On 409 "restricted": what the change would break. */
export const hitsOf = (e: ApiError) => (e.details.hits as RestrictionHit[] | undefined) ?? [];
/** On 422 "implausible": the plausibility limits the change goes past, with the numbers. */
export const checksOf = (e: ApiError) => (e.details.checks as PlausibilityCheck[] | undefined) ?? [];

export const loadApi = {
  saveSettings: (teamId: number, body: Body<typeof teamSettingsPatchSchema>) =>
    sendJson<{ settings: TeamLoadSettings }>("PATCH", loadKeys.teamSettings(teamId), body),
  saveWeekStart: (teamId: number, body: Body<typeof teamWeekSchema>) =>
    sendJson<z.infer<typeof teamWeekSchema>>("PATCH", loadKeys.teamWeekStart(teamId), body),
};

export const noticeApi = {
  act: (alertId: number, body: Body<typeof alertActionSchema>) =>
    sendJson<{ alert: AlertRow }>("PATCH", noticeKeys.alert(alertId), body),
  markSeen: () => sendJson<{ unread: number }>("POST", noticeKeys.alertsSeen),
  saveSettings: (body: Body<typeof notificationSettingsSchema>) =>
    sendJson<NotificationSettingsView>("PUT", noticeKeys.notificationSettings, body),
  newCalendarLink: (athleteId: number) => sendJson<CalendarFeedStatus>("POST", noticeKeys.calendarToken(athleteId)),
  stopCalendarLink: (athleteId: number) => sendJson<CalendarFeedStatus>("DELETE", noticeKeys.calendarToken(athleteId)),
};

export const restrictionApi = {
  create: (athleteId: number, body: Body<typeof createRestrictionSchema>) =>
    sendJson<{ restriction: Restriction }>("POST", restrictionKeys.athlete(athleteId), body),
  act: (restrictionId: number, body: Body<typeof restrictionActionSchema>) =>
    sendJson<{ restriction: Restriction }>("PATCH", restrictionKeys.restriction(restrictionId), body),
};
