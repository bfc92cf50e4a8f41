import { scopeOf, type Action, type Scope } from "@/lib/auth/permissions";
import type { Role } from "@/lib/auth/roles";

export type NavItem = {
  href: string;
  label: string;
  can: Action;
  scope: Scope;
  athleteHref?: (athleteId: number) => string;
};

/** One entry as the navigation shows it; `unread` puts a count beside the label (the alerts inbox). */
export type NavLink = { href: string; label: string; unread?: number };

/**
 * The signed-in navigation. An item shows when the role holds the action at the given scope, so an athlete
 * ("own" scope) never sees squad screens. Hiding an item is convenience only: every page checks again.
 */
const NAV: NavItem[] = [
  { href: "/home", label: "Today", can: "team:view", scope: "own" },
  { href: "/plan", label: "Week plan", can: "plan:view", scope: "team" },
  { href: "/season", label: "Season", can: "plan:view", scope: "team" },
  { href: "/load", label: "Squad load", can: "load:view", scope: "team" },
  { href: "/plan-vs-actual", label: "Plan vs actual", can: "load:view", scope: "team" },
  { href: "/alerts", label: "Alerts", can: "alerts:view", scope: "team" },
  { href: "/status", label: "Squad status", can: "status:view", scope: "team" },
  { href: "/squad", label: "Squad", can: "athletes:view", scope: "team" },
  { href: "/speed", label: "Speed lab", can: "speed:view", scope: "team" },
  { href: "/me", label: "My training", can: "log:write", scope: "own" },
  // The phone-first weekly figures; the day-by-day chart (/load/[own]) is linked from there.
  { href: "/me/load", label: "My load", can: "load:view", scope: "own" },
  { href: "/members", label: "Members", can: "members:manage", scope: "team" },
  { href: "/settings", label: "Thresholds", can: "settings:edit", scope: "team" },
  { href: "/figures", label: "How figures work", can: "team:view", scope: "own" },
];

export function navFor(role: Role): NavItem[] {
  return NAV.filter((item) => {
    const granted = scopeOf(role, item.can);
    if (!granted) return false;
    // "My training" is for athletes; staff reach athletes through the squad screens.
    if (item.scope === "own" && item.can !== "team:view") return granted === "own";
    return item.scope === "own" || granted === "team";
  });
}
