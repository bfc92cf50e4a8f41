import { z } from "zod";
import { requireAthlete } from "@/lib/auth/access";
import { getCalendarFeedStatus, revokeCalendarToken, rotateCalendarToken } from "@/lib/data/calendar-tokens";
import { parseParams, route } from "@/lib/http";

export const runtime = "nodejs";

const paramsSchema = z.object({ athleteId: z.coerce.number().int().positive() });

/** The athlete's feed link (the athlete themself, or a coach of the team). */
export const GET = route<{ athleteId: string }>(async (_req, { params }) => {
  const { athleteId } = parseParams(await params, paramsSchema);
  await requireAthlete({ athleteId, can: "calendar:manage" });
  return Response.json(await getCalendarFeedStatus({ athleteId }));
});

/** Rotate: a new link; the old one stops working. */
export const POST = route<{ athleteId: string }>(async (_req, { params }) => {
  const { athleteId } = parseParams(await params, paramsSchema);
  const viewer = await requireAthlete({ athleteId, can: "calendar:manage" });
  const { token: _token, ...status } = await rotateCalendarToken({ athleteId, createdBy: viewer.userId });
  void _token;
  return Response.json(status, { status: 201 });
});

/** Revoke: the link answers 404 until a new one is made. */
export const DELETE = route<{ athleteId: string }>(async (_req, { params }) => {
  const { athleteId } = parseParams(await params, paramsSchema);
  await requireAthlete({ athleteId, can: "calendar:manage" });
  const revoked = await revokeCalendarToken({ athleteId });
  return Response.json({ revoked, ...(await getCalendarFeedStatus({ athleteId })) });
});
