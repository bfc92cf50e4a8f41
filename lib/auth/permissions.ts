import type { Role } from "./roles";

/**
 * The one permission table. Every page, server action and route handler asks `can(role, action)`
 * through lib/auth/access.ts. "team" reaches every athlete of the member's team; "own" reaches only the
 * athlete profile linked to the signed-in user.
 */
export type Action =
  | "team:view"
  | "members:manage"
  | "settings:edit"
  | "athletes:view"
  | "athletes:edit"
  | "plan:view"
  | "plan:edit"
  | "load:view"
  | "log:write"
  /** Reopen an athlete's log after its 48-hour lock. */
  | "log:unlock"
  /** The athlete's own daily check-in. */
  | "checkin:write"
  | "alerts:view"
  | "alerts:manage"
  | "restrictions:edit"
  /** The medical staff's availability level of an athlete (full / modified / unavailable). */
  | "availability:edit"
  /** The squad status screen and the medical view of one athlete. */
  | "status:view"
  /** A session's thread: read the athlete's log note and the messages, and answer. */
  | "sessions:discuss"
  | "calendar:manage"
  /** The local mailbox: "own" is mail delivered to the member's own address, nothing else. */
  | "mailbox:view"
  /** The team's delivery queue (recipient, kind, status; never a body or link). */
  | "mailbox:queue"
  /** Speed-lab tests and profiles (lib/speed/README.md): view them; upload tests and accept results. */
  | "speed:view"
  | "speed:edit";

export type Scope = "team" | "own";

export const PERMISSIONS: Record<Role, Partial<Record<Action, Scope>>> = {
  head_coach: {
    "team:view": "team",
    "members:manage": "team",
    "settings:edit": "team",
    "athletes:view": "team",
    "athletes:edit": "team",
    "plan:view": "team",
    "plan:edit": "team",
    "load:view": "team",
    "log:write": "team",
    "log:unlock": "team",
    "alerts:view": "team",
    "alerts:manage": "team",
    "calendar:manage": "team",
    "status:view": "team",
    "sessions:discuss": "team",
    "mailbox:view": "own",
    "mailbox:queue": "team",
    "speed:view": "team",
    "speed:edit": "team",
  },
  coach: {
    "team:view": "team",
    "athletes:view": "team",
    "athletes:edit": "team",
    "plan:view": "team",
    "plan:edit": "team",
    "load:view": "team",
    "log:write": "team",
    "log:unlock": "team",
    "alerts:view": "team",
    "alerts:manage": "team",
    "calendar:manage": "team",
    "status:view": "team",
    "sessions:discuss": "team",
    "mailbox:view": "own",
    "speed:view": "team",
    "speed:edit": "team",
  },
  physio: {
    "team:view": "team",
    "athletes:view": "team",
    "plan:view": "team",
    "load:view": "team",
    "alerts:view": "team",
    "alerts:manage": "team",
    "restrictions:edit": "team",
    "availability:edit": "team",
    "status:view": "team",
    "sessions:discuss": "team",
    "mailbox:view": "own",
    "speed:view": "team",
  },
  athlete: {
    "team:view": "team",
    "athletes:view": "own",
    "plan:view": "own",
    "load:view": "own",
    "log:write": "own",
    "checkin:write": "own",
    "calendar:manage": "own",
    "sessions:discuss": "own",
    "mailbox:view": "own",
  },
};

export function scopeOf(role: Role, action: Action): Scope | null {
  return PERMISSIONS[role][action] ?? null;
}

export function can(role: Role, action: Action, scope: Scope = "own"): boolean {
  const granted = scopeOf(role, action);
  if (!granted) return false;
  return granted === "team" || scope === "own";
}
