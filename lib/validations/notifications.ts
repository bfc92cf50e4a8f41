import { z } from "zod";
import { ALERT_EMAIL_MODES } from "@/lib/domain/alerts";
import "./jitless";

export const ALERT_EMAIL_CHOICES = ALERT_EMAIL_MODES;

export const notificationSettingsSchema = z.object({
  alertEmail: z.enum(ALERT_EMAIL_CHOICES, { error: "Choose each alert, a daily digest, or no e-mail" }),
});
