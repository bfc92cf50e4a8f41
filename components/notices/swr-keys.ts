import type { AlertListQuery } from "@/lib/validations/alerts";

/** Every SWR key of the notices screens, so a write can revalidate exactly what it changed. */
export const noticeKeys = {
  alerts: (status: AlertListQuery["status"]) => `/api/alerts?status=${status}`,
  isAlertList: (key: unknown) => typeof key === "string" && key.startsWith("/api/alerts?"),
  notificationSettings: "/api/me/notification-settings",
  calendarToken: (athleteId: number) => `/api/athletes/${athleteId}/calendar-token`,
} as const;
