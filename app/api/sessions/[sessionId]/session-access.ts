import "server-only";
import { requireMember } from "@/lib/auth/access";
import { teamToday } from "@/lib/dates/zoned";
import { findSessionRef, withWeekRows } from "@/lib/data/plan";
import type { PlanWriteResult } from "@/lib/plan/types";
import { AppError } from "@/lib/errors";
import { parseParams } from "@/lib/http";
import { sessionParamsSchema } from "@/lib/validations/plan";

/** A plan writer for the session's team; 404 for a session of another team (nothing is revealed). */
export async function sessionEditor(params: Promise<{ sessionId: string }>) {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const ref = await findSessionRef({ sessionId });
  if (!ref) throw new AppError("not_found", "Not found");
  const viewer = await requireMember({ teamId: ref.teamId, can: "plan:edit" });
  return { sessionId, teamId: ref.teamId, actorUserId: viewer.userId, timeZone: viewer.timeZone };
}

/** The write's answer with the server's week numbers for the athletes it touched. */
export async function answer(ctx: { teamId: number; timeZone: string }, result: PlanWriteResult, status = 200) {
  return Response.json(
    await withWeekRows({ teamId: ctx.teamId, today: teamToday({ timeZone: ctx.timeZone, now: new Date() }), result }),
    { status },
  );
}
