import { requireMember } from "@/lib/auth/access";
import { parseParams, route } from "@/lib/http";
import { readSpeedUpload } from "@/lib/http-upload";
import { uploadMeasurement } from "@/lib/services/speed-measures";
import { teamParamsSchema } from "@/lib/validations/plan";
import { speedMeasureUploadSchema } from "@/lib/validations/speed";

export const runtime = "nodejs";

/** A speed trace, force trace or contact-measurement CSV for one athlete: checked whole, then one test (coaches). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "speed:edit" });
  const input = await readSpeedUpload(req, speedMeasureUploadSchema);
  return Response.json(await uploadMeasurement({ teamId, userId: viewer.userId, input }), { status: 201 });
});
