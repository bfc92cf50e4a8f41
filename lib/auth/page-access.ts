import "server-only";
import { notFound, redirect } from "next/navigation";
import { AppError } from "@/lib/errors";
import { requireAthlete, requireViewer } from "./access";
import { assertCan } from "./authorize";
import type { Action, Scope } from "./permissions";

/** Pages turn access errors into navigation: sign-in, the "not for your role" page, or 404. */
async function guard<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    if (err instanceof AppError) {
      if (err.status === 401) redirect("/sign-in");
      if (err.status === 403) redirect("/not-allowed");
      if (err.status === 404) notFound();
    }
    throw err;
  }
}

/**
 * For a page of the signed-in member's own team; squad screens need "team" scope (the default). The layout and
 * the page share one viewer look-up (requireViewer is cached per request).
 */
export async function pageViewer(can?: Action, scope: Scope = "team") {
  return guard(async () => {
    const viewer = await requireViewer();
    return can ? assertCan(viewer, can, scope) : viewer;
  });
}

export async function pageAthlete(athleteId: number, can: Action) {
  if (!Number.isInteger(athleteId) || athleteId <= 0) notFound();
  return guard(() => requireAthlete({ athleteId, can }));
}
