import "server-only";
import { jsonIds } from "@/lib/db/sql";
import { QueryTypes, type Sequelize } from "sequelize";
import { buildLedger } from "@/lib/load/ledger";
import { db } from "@/models";
import { getLoadSeriesInputs } from "./load";
import { writeLedgerRows } from "./ledger";

/** ms: wall time; cpuMs: this process's CPU time (the figure to trust on a busy machine; SQLite's work runs in its threads). */
export type RebuildReport = { teams: number; athletes: number; rows: number; ms: number; cpuMs: number };

/** A one-line progress bar on stderr (a TTY redraws it in place). */
function progressBar(total: number, enabled: boolean) {
  const width = 30;
  return (done: number) => {
    if (!enabled) return;
    const filled = total === 0 ? width : Math.round((done / total) * width);
    process.stderr.write(`\rledger [${"#".repeat(filled)}${".".repeat(width - filled)}] ${done}/${total} athletes`);
    if (done === total) process.stderr.write("\n");
  };
}

/**
 * Rebuilds every athlete's ledger from scratch (npm run db:rebuild-ledger, migration 011), one transaction per
 * team, and clears the change marks it has taken in.
 */
export async function rebuildLedger({
  sequelize: given,
  progress = false,
  teamIds,
}: { sequelize?: Sequelize; progress?: boolean; teamIds?: readonly number[] } = {}): Promise<RebuildReport> {
  const started = performance.now();
  const cpu = process.cpuUsage();
  const sequelize = given ?? (await db()).sequelize;
  const teams = await sequelize.query<{ team_id: number; athletes: number }>(
    `SELECT t.id AS team_id, (SELECT count(*) FROM athletes a WHERE a.team_id = t.id) AS athletes FROM teams t
      WHERE (:all = 1 OR t.id IN (${jsonIds(sequelize)})) ORDER BY t.id`,
    { type: QueryTypes.SELECT, replacements: { all: teamIds ? 0 : 1, ids: JSON.stringify(teamIds ?? []) } },
  );
  // Migration 011 rebuilds before migration 015 has made the speed profile history: none to read then.
  const tables = await sequelize.getQueryInterface().showAllTables();
  const profileHistory = tables
    .map((t) => (typeof t === "string" ? t : (t as { tableName: string }).tableName))
    .includes("speed_profile_entries");
  const total = teams.reduce((n, t) => n + Number(t.athletes), 0);
  const show = progressBar(total, progress);
  let done = 0;
  let rows = 0;
  show(0);
  for (const { team_id: teamId } of teams) {
    await sequelize.transaction(async (transaction) => {
      const ids = await sequelize.query<{ id: number }>("SELECT id FROM athletes WHERE team_id = :teamId ORDER BY id", {
        type: QueryTypes.SELECT,
        replacements: { teamId },
        transaction,
      });
      // One athlete at a time: a team's whole history at once is mostly garbage-collector work. The next
      // athlete's history is read on the reading connection while this one's rows are computed and written (the
      // team's write turn is held, so nothing it reads can change in between), which keeps a second core busy.
      const read = (id: number) =>
        getLoadSeriesInputs({ sequelize, teamId, athleteIds: [id], through: "9999-12-31", profileHistory });
      let next = ids.length > 0 ? read(ids[0].id) : null;
      try {
        for (let i = 0; i < ids.length; i++) {
          const id = ids[i].id;
          const inputs = await next!;
          next = i + 1 < ids.length ? read(ids[i + 1].id) : null;
          rows += await rebuildOne(inputs, id);
          show(++done);
        }
      } finally {
        // A write that failed leaves the read ahead unawaited.
        void next?.catch(() => undefined);
      }
      async function rebuildOne(inputs: Awaited<ReturnType<typeof read>>, id: number): Promise<number> {
        const a = inputs.athletes[0];
        const ledger = a
          ? buildLedger({
              sessions: a.sessions,
              logs: a.logs,
              profile: a.profile,
              settings: inputs.settings,
            })
          : [];
        await writeLedgerRows({ sequelize, transaction, athleteId: id, keepFrom: 0, from: -1e9, rows: ledger });
        return ledger.length;
      }
      await sequelize.query(
        "DELETE FROM load_ledger_dirty WHERE athlete_id IN (SELECT id FROM athletes WHERE team_id = :teamId)",
        {
          replacements: { teamId },
          transaction,
        },
      );
    });
  }
  if (done < total) show(total);
  // Marks of athletes deleted since (their rows went with them).
  await sequelize.query("DELETE FROM load_ledger_dirty WHERE athlete_id NOT IN (SELECT id FROM athletes)");
  const used = process.cpuUsage(cpu);
  return {
    teams: teams.length,
    athletes: done,
    rows,
    ms: performance.now() - started,
    cpuMs: (used.user + used.system) / 1000,
  };
}
