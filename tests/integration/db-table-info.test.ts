// Sequelize's SQLite dialect asks `PRAGMA table_info` before every model query; the driver (lib/db/sqlite.ts)
// answers it from a per-file cache that DDL clears. Counted with SQLite's own statement trace on a real file.
import type { Database } from "sqlite3";
import { describe, expect, it } from "vitest";
import { onPostgres, setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

const d = await setupTestDb();

describe.skipIf(onPostgres)("PRAGMA table_info", () => {
  it("is sent once per table and file, and again after a schema change", async () => {
    const { teamId } = await createTestTeam(d, { name: "Pragma Club" });
    const sent: string[] = [];
    // The shared reading connection (Sequelize's "default"); a transaction's own connection shares the file's cache.
    const conn = (await d.sequelize.connectionManager.getConnection({ type: "read" })) as Database;
    conn.on("trace", (sql) => sent.push(sql));
    const pragmas = () => sent.filter((s) => /^PRAGMA table_info/i.test(s)).length;
    const read = () => d.Athlete.findAll({ where: { teamId }, attributes: ["id", "name"], raw: true });

    const first = await read();
    await read();
    await d.sequelize.transaction(async (transaction) => {
      await d.Athlete.findAll({ where: { teamId }, attributes: ["id"], transaction });
    });
    const warm = pragmas();
    expect(await read()).toEqual(first);
    expect(first.length).toBeGreaterThan(0);
    expect(pragmas()).toBe(warm);
    // The trace fires as statements run; the earlier reads may have been answered by a cache warmed by the fixture.
    expect(warm).toBeLessThanOrEqual(1);

    await d.sequelize.query("CREATE TABLE pragma_probe (id INTEGER PRIMARY KEY)");
    await read();
    expect(pragmas()).toBe(warm + 1);
    await read();
    expect(pragmas()).toBe(warm + 1);
    await d.sequelize.query("DROP TABLE pragma_probe");
  });
});
