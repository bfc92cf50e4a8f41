// Value sets of planned sessions and their logs, shared by models, validations, the engine and the screens.

export const SESSION_STATUSES = ["draft", "published", "cancelled"] as const;
export type SessionStatus = (typeof SESSION_STATUSES)[number];

/** How much of a session the athlete did, as they logged it. */
export const COMPLETIONS = ["yes", "partly", "no"] as const;
export type Completion = (typeof COMPLETIONS)[number];
