import { requireMember } from "@/lib/auth/access";
import { parseParams, route } from "@/lib/http";
import { acceptSpeedTest } from "@/lib/services/speed-lab";
import { speedTestParamsSchema } from "@/lib/validations/speed";

export const runtime = "nodejs";

/** Accepts a test's result into the athlete's speed profile from the test's date on (coaches). */
export const POST = route<{ teamId: string; testId: string }>(async (_req, { params }) => {
  const { teamId, testId } = parseParams(await params, speedTestParamsSchema);
  const viewer = await requireMember({ teamId, can: "speed:edit" });
  return Response.json(await acceptSpeedTest({ teamId, testId, userId: viewer.userId, now: new Date() }));
});
