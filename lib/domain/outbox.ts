// Value sets of the e-mail outbox.

export const OUTBOX_KINDS = [
  "alert",
  "digest",
  "invitation",
  "password_reset",
  "calendar_request",
  "calendar_cancel",
  "session_message",
] as const;
export type OutboxKind = (typeof OUTBOX_KINDS)[number];

export const OUTBOX_STATUSES = ["pending", "sending", "sent", "failed"] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];
