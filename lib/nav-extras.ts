import "server-only";
import type { Viewer } from "@/lib/auth/access";
import type { NavLink } from "@/components/shell/workspace-nav";

/**
 * Navigation entries that depend on runtime state (e.g. the unread alert count, the local mailbox in
 * development). Features register here; kept separate so lib/nav.ts stays a plain, testable table.
 */
export async function extraNavLinks(viewer: Viewer): Promise<NavLink[]> {
  void viewer;
  return [];
}
