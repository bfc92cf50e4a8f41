// Value sets of the e-mail outbox.

export type OutboxKind =
  "alert" | "digest" | "invitation" | "password_reset" | "calendar_request" | "calendar_cancel" | "session_message";

export type OutboxStatus = "pending" | "sending" | "sent" | "failed";
