import { RETRY_AFTER_S } from "@/lib/db/busy";
import { databaseState } from "@/lib/db/health";
import { databaseStorage } from "@/lib/env";
import { db } from "@/models";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

// Public probe: says whether the database answers and can take writes, nothing about its contents.
export async function GET() {
  try {
    const state = await databaseState({ sequelize: (await db()).sequelize, storage: databaseStorage() });
    if (state === "ok") return Response.json({ ok: true, db: "ok" });
    return Response.json(
      { ok: false, db: state },
      { status: 503, headers: state === "busy" ? { "Retry-After": String(RETRY_AFTER_S) } : {} },
    );
  } catch {
    return Response.json({ ok: false, db: "down" }, { status: 503 });
  }
}
