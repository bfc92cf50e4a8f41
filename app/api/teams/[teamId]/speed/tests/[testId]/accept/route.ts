import { requireMember } from "@/lib/auth/access";
import { parseOptionalJson, parseParams, route } from "@/lib/http";
import { acceptSpeedTest } from "@/lib/services/speed-lab";
import { speedAcceptSchema, speedTestParamsSchema } from "@/lib/validations/speed";

export const runtime = "nodejs";

/**
 * Accepts a test's result into the athlete's speed profile from the test's date on (coaches). A day that already
 * has a result answers 409 saying so; `{ replace: true }` replaces it, keeping the replaced one in the history.
 */
export const POST = route<{ teamId: string; testId: string }>(async (req, { params }) => {
  const { teamId, testId } = parseParams(await params, speedTestParamsSchema);
  const viewer = await requireMember({ teamId, can: "speed:edit" });
  const { replace } = await parseOptionalJson(req, speedAcceptSchema);
  return Response.json(await acceptSpeedTest({ teamId, testId, userId: viewer.userId, now: new Date(), replace }));
});
