import "server-only";
import { AppError } from "@/lib/errors";
import { db } from "@/models";
import { scopeOf, type Action, type Scope } from "./permissions";
import type { Role } from "./roles";

export type Viewer = {
  userId: number;
  name: string;
  email: string;
  teamId: number;
  teamName: string;
  timeZone: string;
  weekStartDay: number;
  role: Role;
  /** The athlete profile linked to this user in this team, if any. */
  athleteId: number | null;
};

/** Loads the member's standing in a team from the database (not from the JWT, which may be stale). */
export async function loadViewer({ userId, teamId }: { userId: number; teamId?: number }): Promise<Viewer | null> {
  const { Membership, Team, User, Athlete } = await db();
  const membership = await Membership.findOne({
    where: teamId ? { userId, teamId } : { userId },
    attributes: ["teamId", "role"],
    order: [["id", "ASC"]],
  });
  if (!membership) return null;
  const [team, user, athlete] = await Promise.all([
    Team.findByPk(membership.teamId, { attributes: ["id", "name", "timeZone", "weekStartDay"] }),
    User.findByPk(userId, { attributes: ["id", "name", "email"] }),
    Athlete.findOne({ where: { userId, teamId: membership.teamId }, attributes: ["id"] }),
  ]);
  if (!team || !user) return null;
  return {
    userId,
    name: user.name,
    email: user.email,
    teamId: team.id,
    teamName: team.name,
    timeZone: team.timeZone,
    weekStartDay: team.weekStartDay,
    role: membership.role,
    athleteId: athlete?.id ?? null,
  };
}

/**
 * The single authorization decision for team data. Non-members get 404 so that another team's ids reveal
 * nothing; members without the permission get 403. `scope: "team"` (the default) demands squad-wide access;
 * pass "own" where the caller filters the answer down to the viewer's own athlete.
 */
export async function authorizeTeam({
  userId,
  teamId,
  can,
  scope = "team",
}: {
  userId: number | null;
  teamId: number;
  can: Action;
  scope?: Scope;
}): Promise<Viewer> {
  if (!userId) throw new AppError("unauthenticated", "Sign in first");
  const viewer = await loadViewer({ userId, teamId });
  if (!viewer) throw new AppError("not_found", "Not found");
  return assertCan(viewer, can, scope);
}

/** 403 unless the member's role grants `can` in `scope` (the permission half of authorizeTeam). */
export function assertCan(viewer: Viewer, can: Action, scope: Scope = "team"): Viewer {
  const granted = scopeOf(viewer.role, can);
  if (!granted || (scope === "team" && granted !== "team"))
    throw new AppError("forbidden", "Your role does not allow this");
  return viewer;
}

export type AthleteRef = { id: number; teamId: number; userId: number | null; name: string };

/** Authorizes an action on one athlete: "team" scope reaches any athlete of the team, "own" only the linked one. */
export async function authorizeAthlete({
  userId,
  athleteId,
  can,
}: {
  userId: number | null;
  athleteId: number;
  can: Action;
}): Promise<Viewer & { athlete: AthleteRef }> {
  if (!userId) throw new AppError("unauthenticated", "Sign in first");
  const { Athlete } = await db();
  const athlete = await Athlete.findByPk(athleteId, { attributes: ["id", "teamId", "userId", "name"] });
  if (!athlete) throw new AppError("not_found", "Not found");
  const viewer = await loadViewer({ userId, teamId: athlete.teamId });
  if (!viewer) throw new AppError("not_found", "Not found");
  const scope = scopeOf(viewer.role, can);
  if (!scope) throw new AppError("forbidden", "Your role does not allow this");
  // An athlete asking for someone else's data learns nothing about it.
  if (scope === "own" && athlete.userId !== userId) throw new AppError("not_found", "Not found");
  return { ...viewer, athlete: { id: athlete.id, teamId: athlete.teamId, userId: athlete.userId, name: athlete.name } };
}
