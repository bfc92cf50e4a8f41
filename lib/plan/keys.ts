// SWR keys and API paths of the planner, in one place.

export const planWeekKey = (teamId: number, week: string) => `/api/teams/${teamId}/plan?week=${week}`;
export const teamSessionsPath = (teamId: number) => `/api/teams/${teamId}/sessions`;
export const sessionPath = (sessionId: number) => `/api/sessions/${sessionId}`;
export const sessionBlocksPath = (sessionId: number) => `/api/sessions/${sessionId}/blocks`;
export const sessionBlockPath = (sessionId: number, blockId: number) => `/api/sessions/${sessionId}/blocks/${blockId}`;
export const teamTemplatesPath = (teamId: number) => `/api/teams/${teamId}/templates`;
export const templatePath = (templateId: number) => `/api/templates/${templateId}`;
export const weekToolPath = (teamId: number, tool: "copy-to-next" | "clear" | "publish") =>
  `/api/teams/${teamId}/plan/${tool}`;
