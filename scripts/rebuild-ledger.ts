// npm run db:rebuild-ledger: every athlete's load ledger from scratch, with a progress bar on stderr.
import { rebuildLedger } from "@/lib/data/ledger-rebuild";
import { databaseStorage } from "@/lib/env";
import { closeDb } from "@/models";

async function main() {
  const report = await rebuildLedger({ progress: true });
  console.log(
    `ledger rebuilt in ${databaseStorage()}: ${report.athletes} athletes of ${report.teams} teams, ` +
      `${report.rows} rows in ${(report.ms / 1000).toFixed(2)} s (CPU ${(report.cpuMs / 1000).toFixed(2)} s)`,
  );
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
