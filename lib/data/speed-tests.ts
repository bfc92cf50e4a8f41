import "server-only";
import { createHash } from "node:crypto";
import { col, fn, type Transaction } from "sequelize";
import type { SpeedStartType, SpeedTestKind } from "@/lib/domain/speed";
import { AppError } from "@/lib/errors";
import { db, type SpeedTest } from "@/models";

// Speed-lab uploads and tests (migration 015). The file is kept as it came; each test keeps the measurements
// as entered and the result computed from them (JSON text).

export type SpeedTestRow = {
  id: number;
  athleteId: number;
  kind: SpeedTestKind;
  testDate: string;
  startType: SpeedStartType | null;
  bodyMassKg: number | null;
  uploadId: number | null;
  plannedSessionId: number | null;
  data: unknown;
  result: unknown;
  createdAt: Date;
};

export type NewSpeedTest = Omit<SpeedTestRow, "id" | "createdAt" | "uploadId">;

export async function insertSpeedUpload({
  teamId,
  userId,
  fileName,
  kind,
  content,
  transaction,
}: {
  teamId: number;
  userId: number | null;
  fileName: string;
  kind: SpeedTestKind;
  content: string;
  transaction: Transaction;
}): Promise<{ id: number }> {
  const { SpeedUpload } = await db();
  const row = await SpeedUpload.create(
    {
      teamId,
      uploadedByUserId: userId,
      fileName: fileName.slice(0, 200),
      kind,
      sizeBytes: Buffer.byteLength(content, "utf8"),
      sha256: createHash("sha256").update(content, "utf8").digest("hex"),
      content,
    },
    { transaction },
  );
  return { id: row.id };
}

export async function insertSpeedTests({
  teamId,
  userId,
  uploadId,
  tests,
  transaction,
}: {
  teamId: number;
  userId: number | null;
  uploadId: number | null;
  tests: readonly NewSpeedTest[];
  transaction: Transaction;
}): Promise<number[]> {
  const { SpeedTest } = await db();
  const ids: number[] = [];
  for (const t of tests) {
    const row = await SpeedTest.create(
      {
        teamId,
        athleteId: t.athleteId,
        uploadId,
        plannedSessionId: t.plannedSessionId,
        createdByUserId: userId,
        kind: t.kind,
        testDate: t.testDate,
        startType: t.startType,
        bodyMassKg: t.bodyMassKg,
        data: JSON.stringify(t.data),
        result: JSON.stringify(t.result),
      },
      { transaction },
    );
    ids.push(row.id);
  }
  return ids;
}

const FIELDS = [
  "id",
  "athleteId",
  "kind",
  "testDate",
  "startType",
  "bodyMassKg",
  "uploadId",
  "plannedSessionId",
  "data",
  "result",
  "createdAt",
] as const;

// A raw read (`raw: true`) answers plain objects with the model's fields; PostgreSQL may hand numbers and dates
// over as text, hence the conversions.
function toRow(r: Pick<SpeedTest, (typeof FIELDS)[number]>): SpeedTestRow {
  return {
    id: Number(r.id),
    athleteId: Number(r.athleteId),
    kind: r.kind,
    testDate: String(r.testDate).slice(0, 10),
    startType: r.startType ?? null,
    bodyMassKg: r.bodyMassKg === null ? null : Number(r.bodyMassKg),
    uploadId: r.uploadId === null ? null : Number(r.uploadId),
    plannedSessionId: r.plannedSessionId === null ? null : Number(r.plannedSessionId),
    data: JSON.parse(String(r.data)),
    result: JSON.parse(String(r.result)),
    createdAt: r.createdAt,
  };
}

/** One test of the team; 404 when it is not there (or belongs to another team). */
export async function getSpeedTest({
  teamId,
  testId,
  transaction,
}: {
  teamId: number;
  testId: number;
  transaction?: Transaction;
}): Promise<SpeedTestRow> {
  const { SpeedTest } = await db();
  const row = await SpeedTest.findOne({
    where: { id: testId, teamId },
    attributes: [...FIELDS],
    raw: true,
    transaction,
  });
  if (!row) throw new AppError("not_found", "Not found");
  return toRow(row);
}

/** An athlete's tests, newest first (or the whole team's with no athleteId). */
export async function listSpeedTests({
  teamId,
  athleteId,
  kind,
}: {
  teamId: number;
  athleteId?: number;
  kind?: SpeedTestKind;
}): Promise<SpeedTestRow[]> {
  const { SpeedTest } = await db();
  const where = { teamId, ...(athleteId ? { athleteId } : {}), ...(kind ? { kind } : {}) };
  const rows = await SpeedTest.findAll({
    where,
    attributes: [...FIELDS],
    order: [
      ["testDate", "DESC"],
      ["id", "DESC"],
    ],
    raw: true,
  });
  return rows.map(toRow);
}

/** Each athlete's latest test date of one kind (athlete id → YYYY-MM-DD); one grouped read over the index. */
export async function latestTestDates({
  teamId,
  kind,
}: {
  teamId: number;
  kind: SpeedTestKind;
}): Promise<Map<number, string>> {
  const { SpeedTest } = await db();
  const rows = await SpeedTest.findAll({
    where: { teamId, kind },
    attributes: ["athleteId", [fn("MAX", col("test_date")), "latest"]],
    group: ["athleteId"],
  });
  // `latest` is not a model field: get() reads it from the row as the database answered.
  return new Map(rows.map((r) => [Number(r.athleteId), String(r.get("latest")).slice(0, 10)]));
}
