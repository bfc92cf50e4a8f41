import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { AppError } from "@/lib/errors";
import { authorizeAthlete, authorizeTeam, loadViewer, type Viewer } from "./authorize";
import { authOptions } from "./options";
import type { Action, Scope } from "./permissions";

export type { Viewer } from "./authorize";

// React's cache(): one session check and one viewer look-up per page request, however many layouts and pages
// ask (outside a render, e.g. in a route handler, it calls through).
export const sessionUserId = cache(async (): Promise<number | null> => {
  const session = await getServerSession(authOptions);
  return session?.user?.id || null;
});

/** The signed-in user's standing in their (first) team; 401 when signed out. */
export const requireViewer = cache(async (): Promise<Viewer> => {
  const userId = await sessionUserId();
  if (!userId) throw new AppError("unauthenticated", "Sign in first");
  const viewer = await loadViewer({ userId });
  if (!viewer) throw new AppError("forbidden", "You are not a member of any team");
  return viewer;
});

/** Every handler, action and page that touches team data calls this (or requireAthlete). */
export async function requireMember({
  teamId,
  can,
  scope,
}: {
  teamId: number;
  can: Action;
  scope?: Scope;
}): Promise<Viewer> {
  return authorizeTeam({ userId: await sessionUserId(), teamId, can, scope });
}

export async function requireAthlete({ athleteId, can }: { athleteId: number; can: Action }) {
  return authorizeAthlete({ userId: await sessionUserId(), athleteId, can });
}
