import { requireMember } from "@/lib/auth/access";
import { parseParams, route } from "@/lib/http";
import { uploadTimingCsv } from "@/lib/services/speed-uploads";
import { readSpeedUpload } from "@/lib/http-upload";
import { teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** A timing-gate CSV ({ fileName, content }): every line checked first, then one test per trial (coaches). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "speed:edit" });
  const body = await readSpeedUpload(req);
  return Response.json(await uploadTimingCsv({ teamId, userId: viewer.userId, ...body }), { status: 201 });
});
