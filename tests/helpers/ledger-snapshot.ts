import { QueryTypes, type Sequelize } from "sequelize";

const BLOBS = ["past", "today", "ahead", "planned", "cum", "acute", "chronic", "ratio"];

/** Every stored ledger row as text (its BLOBs in hex: SQLite's hex(), PostgreSQL's encode), to compare two ledgers exactly. */
export async function ledgerSnapshot(sequelize: Sequelize): Promise<string[]> {
  const hex = (c: string) => (sequelize.getDialect() === "postgres" ? `encode(${c}, 'hex')` : `hex(${c})`);
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT athlete_id, day, flags, on_record, kept, ${BLOBS.map(hex).join(" || ")} AS v
       FROM load_ledger ORDER BY athlete_id, day`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => Object.values(r).join("|"));
}
