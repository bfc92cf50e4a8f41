import type { LoadView, Metric } from "@/lib/load/types";
import type { AlertListQuery } from "@/lib/validations/alerts";

// Every URL the browser reads (SWR keys) or writes, so a write can `mutate` exactly the keys it changed.

export const planKeys = {
  week: (teamId: number, week: string) => `/api/teams/${teamId}/plan?week=${week}`,
  teamSessions: (teamId: number) => `/api/teams/${teamId}/sessions`,
  session: (sessionId: number) => `/api/sessions/${sessionId}`,
  sessionBlocks: (sessionId: number) => `/api/sessions/${sessionId}/blocks`,
  sessionBlock: (sessionId: number, blockId: number) => `/api/sessions/${sessionId}/blocks/${blockId}`,
  sessionLog: (sessionId: number) => `/api/sessions/${sessionId}/log`,
  teamTemplates: (teamId: number) => `/api/teams/${teamId}/templates`,
  template: (templateId: number) => `/api/templates/${templateId}`,
  weekTool: (teamId: number, tool: "copy-to-next" | "clear" | "publish") => `/api/teams/${teamId}/plan/${tool}`,
};

export const loadKeys = {
  squadWeek: (teamId: number, week: string, view: LoadView) => `/api/teams/${teamId}/load?week=${week}&view=${view}`,
  athlete: (athleteId: number, q: { from: string; to: string; view: LoadView; metric: Metric }) =>
    `/api/athletes/${athleteId}/load?from=${q.from}&to=${q.to}&view=${q.view}&metric=${q.metric}`,
  /** Matches every load answer (squad weeks and athletes): all of them depend on the team's thresholds. */
  isLoad: (key: unknown) => typeof key === "string" && key.includes("/load"),
  teamSettings: (teamId: number) => `/api/teams/${teamId}/settings`,
  teamWeekStart: (teamId: number) => `/api/teams/${teamId}/week-start`,
};

export const noticeKeys = {
  alerts: (status: AlertListQuery["status"]) => `/api/alerts?status=${status}`,
  isAlertList: (key: unknown) => typeof key === "string" && key.startsWith("/api/alerts?"),
  alert: (alertId: number) => `/api/alerts/${alertId}`,
  alertsSeen: "/api/alerts/seen",
  notificationSettings: "/api/me/notification-settings",
  calendarToken: (athleteId: number) => `/api/athletes/${athleteId}/calendar-token`,
} as const;

export const restrictionKeys = {
  athlete: (athleteId: number) => `/api/athletes/${athleteId}/restrictions`,
  restriction: (restrictionId: number) => `/api/restrictions/${restrictionId}`,
} as const;

export const medicalKeys = {
  availability: (athleteId: number) => `/api/athletes/${athleteId}/availability`,
  thread: (sessionId: number) => `/api/sessions/${sessionId}/messages`,
} as const;

export const seasonKeys = {
  view: (teamId: number, from: string, weeks: number) => `/api/teams/${teamId}/season?from=${from}&weeks=${weeks}`,
  export: (teamId: number, from: string, weeks: number) =>
    `/api/teams/${teamId}/season/export?from=${from}&weeks=${weeks}`,
  phases: (teamId: number) => `/api/teams/${teamId}/season/phases`,
  phase: (phaseId: number) => `/api/season-phases/${phaseId}`,
  copyPhase: (phaseId: number) => `/api/season-phases/${phaseId}/copy`,
  meets: (teamId: number) => `/api/teams/${teamId}/season/meets`,
  meet: (meetId: number) => `/api/meets/${meetId}`,
  progression: (teamId: number) => `/api/teams/${teamId}/season/progression`,
  progressionBase: (teamId: number, q: { sourceWeek: string; firstWeek: string; to: string }) =>
    `/api/teams/${teamId}/season/progression?${new URLSearchParams(q)}`,
} as const;

/** The athlete's own reports: check-ins, a locked log reopened by a coach, the team's report settings. */
export const athleteReportKeys = {
  checkIns: (athleteId: number) => `/api/athletes/${athleteId}/check-ins`,
  unlockLog: (sessionId: number) => `/api/sessions/${sessionId}/log/unlock`,
  teamSettings: (teamId: number) => `/api/teams/${teamId}/athlete-reports`,
} as const;

/** The speed lab: uploads, acceptance and settings (lib/client/speed.ts sends them), and the CSV templates. */
export const speedKeys = {
  timingUploads: (teamId: number) => `/api/teams/${teamId}/speed/timing-uploads`,
  measureUploads: (teamId: number) => `/api/teams/${teamId}/speed/measure-uploads`,
  accept: (teamId: number, testId: number) => `/api/teams/${teamId}/speed/tests/${testId}/accept`,
  settings: (teamId: number) => `/api/teams/${teamId}/speed/settings`,
  /** Our own column layouts as downloadable examples (lib/speed/README.md §5, §9). */
  templates: {
    timing: "/speed-timing-template.csv",
    trace: "/speed-trace-template.csv",
    force: "/speed-force-template.csv",
    contacts: "/speed-contacts-template.csv",
  },
};
