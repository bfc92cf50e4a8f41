import { requireMember } from "@/lib/auth/access";
import { saveSpeedLabSettings } from "@/lib/data/speed-settings";
import { parseJson, parseParams, route } from "@/lib/http";
import { teamParamsSchema } from "@/lib/validations/plan";
import { speedLabSettingsSchema } from "@/lib/validations/speed";

export const runtime = "nodejs";

/** The re-test interval: weeks without a timing test before an athlete is due one (coaches who run the lab). */
export const PATCH = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "speed:edit" });
  const input = await parseJson(req, speedLabSettingsSchema);
  return Response.json(await saveSpeedLabSettings({ teamId, input }));
});
