import "server-only";
import type { Viewer } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { countUnreadAlerts } from "@/lib/data/alerts";
import { isFakeMailbox } from "@/lib/mail/transport";
import type { NavLink } from "@/lib/nav";

/**
 * Navigation entries that depend on runtime state (e.g. the unread alert count, the local mailbox in
 * development). Features register here; kept separate so lib/nav.ts stays a plain, testable table.
 * An entry with the href of a NAV item replaces that item (same place, e.g. with a badge).
 */
export async function extraNavLinks(viewer: Viewer): Promise<NavLink[]> {
  const links: NavLink[] = [];
  if (can(viewer.role, "alerts:view", "team")) {
    const unread = await countUnreadAlerts({ teamId: viewer.teamId, userId: viewer.userId });
    links.push({ href: "/alerts", label: "Alerts", ...(unread > 0 ? { unread } : {}) });
  }
  if (isFakeMailbox()) links.push({ href: "/mailbox", label: "Mailbox" });
  return links;
}
