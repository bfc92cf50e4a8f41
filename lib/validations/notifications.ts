import { z } from "zod";
import "./jitless";

export const ALERT_EMAIL_CHOICES = ["each", "digest", "off"] as const;

export const notificationSettingsSchema = z.object({
  alertEmail: z.enum(ALERT_EMAIL_CHOICES, { error: "Choose each alert, a daily digest, or no e-mail" }),
});

export type NotificationSettingsInput = z.infer<typeof notificationSettingsSchema>;
