import { QueryTypes } from "sequelize";
import { db } from "@/models";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

// Public liveness probe: says whether the database answers, nothing about its contents.
export async function GET() {
  try {
    const { sequelize } = await db();
    await sequelize.query("SELECT 1", { type: QueryTypes.SELECT });
    return Response.json({ ok: true });
  } catch {
    return Response.json({ ok: false }, { status: 503 });
  }
}
