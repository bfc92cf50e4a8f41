// The ledger is written inside each write's transaction, so a process killed mid-write leaves the database intact
// and the ledger equal to a rebuild of what committed (lib/load/README.md §12).
import { spawn } from "node:child_process";
import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { teamToday } from "@/lib/dates/zoned";
import { createTestTeam } from "../helpers/fixtures";
import { onPostgres, setupTestDb } from "../helpers/db";
import { ledgerSnapshot } from "../helpers/ledger-snapshot";

const d = await setupTestDb();
const { ledgerHasMarks } = await import("@/lib/data/ledger");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const team = await createTestTeam(d, { name: "Crash Club" });
const athleteId = Object.values(team.users).find((u) => u.athleteId)!.athleteId!;
const coach = team.users.coach!.userId;
const today = teamToday({ timeZone: "Europe/London", now: new Date() });

const snapshot = () => ledgerSnapshot(d.sequelize);

describe("load ledger under kill -9", () => {
  it("a writer killed mid-loop leaves integrity_check ok, no pending mark, and the ledger equal to a rebuild", async () => {
    const child = spawn(
      process.execPath,
      ["--conditions=react-server", "--import", "tsx", "tests/helpers/ledger-writer.ts"],
      {
        env: {
          // Not the test worker's IPC channel or loader hooks: the child would write into vitest's own pipe.
          ...(Object.fromEntries(
            Object.entries(process.env).filter(([k]) => !/^(NODE_CHANNEL|NODE_OPTIONS|VITEST)/.test(k)),
          ) as NodeJS.ProcessEnv),
          LEDGER_TEAM_ID: String(team.teamId),
          LEDGER_ATHLETE_ID: String(athleteId),
          LEDGER_ACTOR_ID: String(coach),
          LEDGER_TODAY: today,
        },
        stdio: ["ignore", "pipe", "pipe"],
      },
    );
    let writes = 0;
    let errors = "";
    child.stderr.on("data", (b: Buffer) => (errors += b.toString()));
    await new Promise<void>((resolve, reject) => {
      child.stdout.on("data", (b: Buffer) => {
        writes += (b.toString().match(/wrote/g) ?? []).length;
        // Killed at a random point of a later write, not between two.
        if (writes >= 6) setTimeout(() => resolve(), Math.floor(Math.random() * 40));
      });
      child.on("exit", (code) => {
        if (code !== null) console.log(`WRITER EXIT ${code}`, errors.slice(0, 2000));
        if (code === null) resolve();
        else reject(new Error(`writer exited ${code}`));
      });
    });
    child.kill("SIGKILL");
    await new Promise((r) => child.once("close", r));
    // SQLite's file check; PostgreSQL has no such statement (its own crash recovery keeps the cluster whole).
    if (!onPostgres) {
      const [check] = await d.sequelize.query<{ integrity_check: string }>("PRAGMA integrity_check", {
        type: QueryTypes.SELECT,
      });
      expect(check.integrity_check).toBe("ok");
    }
    expect(writes).toBeGreaterThanOrEqual(6);
    // Every committed write refreshed the ledger in its own transaction: nothing is left marked.
    expect(await ledgerHasMarks({})).toBe(false);
    const stored = await snapshot();
    expect(stored.length).toBeGreaterThan(0);
    await rebuildLedger();
    expect(await snapshot()).toEqual(stored);
  }, 120_000);
});
