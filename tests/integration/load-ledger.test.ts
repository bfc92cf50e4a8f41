// The load ledger on a real SQLite file (lib/load/README.md §12): triggers mark every change to sessions, blocks,
// logs, profiles and team settings; a refresh takes the marks in; the stored rows always equal a full rebuild.
import { describe, expect, it } from "vitest";
import { teamToday } from "@/lib/dates/zoned";
import { seedDemo } from "@/lib/seed";
import { setupTestDb } from "../helpers/db";
import { ledgerSnapshot } from "../helpers/ledger-snapshot";

const d = await setupTestDb();
const { ensureLedgerFresh, ledgerHasMarks, refreshLedger } = await import("@/lib/data/ledger");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
await seedDemo(d, { today });

const snapshot = () => ledgerSnapshot(d.sequelize);

describe("load ledger storage", () => {
  it("the seed's writes are marked and a refresh takes them in; it then equals a rebuild from scratch", async () => {
    expect(await ledgerHasMarks({})).toBe(true);
    await ensureLedgerFresh({});
    expect(await ledgerHasMarks({})).toBe(false);
    const refreshed = await snapshot();
    expect(refreshed.length).toBeGreaterThan(1000);
    const report = await rebuildLedger();
    expect(report.rows).toBe(refreshed.length);
    expect(await snapshot()).toEqual(refreshed);
  });

  it("a changed log, block, profile and setting each mark the athletes they touch", async () => {
    const log = (await d.SessionLog.findOne({ raw: true }))!;
    await d.SessionLog.update({ rpe: 9 }, { where: { id: log.id } });
    expect(await ledgerHasMarks({ athleteIds: [log.athleteId] })).toBe(true);
    await d.sequelize.transaction((transaction) => refreshLedger({ transaction }));
    const block = (await d.SessionBlock.findOne({ raw: true }))!;
    await d.SessionBlock.destroy({ where: { id: block.id } });
    expect(await ledgerHasMarks({})).toBe(true);
    await ensureLedgerFresh({});
    const athlete = (await d.Athlete.findOne({ raw: true }))!;
    await d.Athlete.update({ vmaxMs: 9.7 }, { where: { id: athlete.id } });
    expect(await ledgerHasMarks({ athleteIds: [athlete.id] })).toBe(true);
    await ensureLedgerFresh({});
    await d.TeamLoadSettings.update(
      { acwrMethod: "rolling_uncoupled", missingLogs: "exclude" },
      { where: { teamId: athlete.teamId } },
    );
    expect(await ledgerHasMarks({ athleteIds: [athlete.id] })).toBe(true);
    await ensureLedgerFresh({});
    const kept = await snapshot();
    await rebuildLedger();
    expect(await snapshot()).toEqual(kept);
  });
});
