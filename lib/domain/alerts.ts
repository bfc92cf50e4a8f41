// Value sets of load alerts and of who gets them by e-mail.

/** "pain": an athlete's pain report above the team's line (lib/domain/wellbeing.ts), not a load figure. */
export type AlertKind =
  "spike" | "weekly_jump" | "plyo_volume" | "recovery" | "restriction_override" | "pain" | "restriction_conflict";

export type AlertStatus = "open" | "acknowledged" | "resolved";

/** Whether an alert was raised on the planned sessions or on what the athlete logged. */
export type AlertBasis = "planned" | "actual";

/** A member's choice of alert e-mail: one per alert, a daily digest, or none. */
export const ALERT_EMAIL_MODES = ["each", "digest", "off"] as const;
export type AlertEmailMode = (typeof ALERT_EMAIL_MODES)[number];
