// Any sequence of plan writes, logs, profile and threshold changes through the real data path leaves the ledger
// equal, day by day, to a rebuild from scratch, with nothing left to take in (lib/load/README.md §12).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { createSessionSchema } from "@/lib/validations/plan";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";
import { ledgerSnapshot } from "../helpers/ledger-snapshot";

const d = await setupTestDb();
const { ledgerHasMarks } = await import("@/lib/data/ledger");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const { createSessions, deleteSession, updateSession } = await import("@/lib/services/plan-sessions");
const { getLogTarget } = await import("@/lib/data/logs");
const { saveSessionLog, deleteSessionLog } = await import("@/lib/services/session-logs");
const { updateAthlete } = await import("@/lib/services/athletes");
const { updateTeamLoadSettings } = await import("@/lib/services/team-settings");
const team = await createTestTeam(d, { name: "Property Club" });
const athletes = Object.values(team.users).flatMap((u) => (u.athleteId ? [u.athleteId] : []));
const coach = team.users.coach!.userId;
const today = teamToday({ timeZone: "Europe/London", now: new Date() });

const snapshot = () => ledgerSnapshot(d.sequelize);

async function sessionIds(): Promise<{ id: number; version: number; status: string; date: string }[]> {
  return d.PlannedSession.findAll({
    attributes: ["id", "version", "status", "date"],
    raw: true,
    order: [["id", "ASC"]],
  });
}

const pick = <T>(list: readonly T[], n: number): T | undefined => (list.length ? list[n % list.length] : undefined);

const command = fc.oneof(
  fc.record({
    kind: fc.constant("create" as const),
    athlete: fc.nat(),
    day: fc.integer({ min: -60, max: 20 }),
    rpe: fc.integer({ min: 1, max: 10 }),
  }),
  fc.record({ kind: fc.constant("publish" as const), n: fc.nat() }),
  fc.record({
    kind: fc.constant("move" as const),
    n: fc.nat(),
    by: fc.integer({ min: -9, max: 9 }),
    minutes: fc.integer({ min: 20, max: 150 }),
  }),
  fc.record({ kind: fc.constant("delete" as const), n: fc.nat() }),
  fc.record({
    kind: fc.constant("log" as const),
    n: fc.nat(),
    rpe: fc.integer({ min: 1, max: 10 }),
    done: fc.constantFrom("yes", "partly", "no"),
  }),
  fc.record({ kind: fc.constant("unlog" as const), n: fc.nat() }),
  fc.record({
    kind: fc.constant("profile" as const),
    athlete: fc.nat(),
    vmax: fc.double({ min: 7, max: 11, noNaN: true }),
  }),
  fc.record({
    kind: fc.constant("settings" as const),
    method: fc.constantFrom("ewma", "rolling_coupled", "rolling_uncoupled"),
    missingLogs: fc.constantFrom("estimate", "exclude"),
    hsr: fc.constantFrom(5, 5.5, 6),
  }),
);

type Command = typeof command extends fc.Arbitrary<infer C> ? C : never;

async function run(c: Command): Promise<void> {
  const list = await sessionIds();
  if (c.kind === "create") {
    const input = createSessionSchema.parse({
      from: "blank",
      athleteId: pick(athletes, c.athlete),
      date: addDays(today, c.day),
      startTime: "17:00",
      durationMin: 60,
      title: "Prop",
      plannedRpe: c.rpe,
      blocks: [
        {
          kind: "max_velocity",
          title: "Flying",
          running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
          drills: [],
          notes: "",
        },
      ],
    });
    await createSessions({ teamId: team.teamId, actorUserId: coach, input });
  } else if (c.kind === "publish" || c.kind === "move") {
    const s = pick(
      list.filter((x) => x.status !== "cancelled"),
      c.n,
    );
    if (!s) return;
    const input =
      c.kind === "publish"
        ? { version: s.version, status: "published" as const }
        : { version: s.version, date: addDays(s.date, c.by), durationMin: c.minutes };
    await updateSession({ teamId: team.teamId, actorUserId: coach, sessionId: s.id, input });
  } else if (c.kind === "delete") {
    const s = pick(list, c.n);
    if (s) await deleteSession({ teamId: team.teamId, actorUserId: coach, sessionId: s.id, version: s.version });
  } else if (c.kind === "log" || c.kind === "unlog") {
    const s = pick(
      list.filter((x) => x.status === "published" && x.date <= today),
      c.n,
    );
    const target = s ? await getLogTarget({ sessionId: s.id }) : null;
    if (!target) return;
    if (c.kind === "unlog") await deleteSessionLog({ target, actorUserId: coach });
    else {
      const done = c.done === "no" ? { rpe: null, minutes: null } : { rpe: c.rpe, minutes: 50 };
      await saveSessionLog({
        target,
        input: { completion: c.done, ...done, notes: null, completedReps: null },
        actorUserId: coach,
        today,
      });
    }
  } else if (c.kind === "profile") {
    const id = pick(athletes, c.athlete)!;
    const a = (await d.Athlete.findByPk(id, { raw: true }))!;
    await updateAthlete({
      teamId: team.teamId,
      athleteId: id,
      input: {
        name: a.name,
        groupId: a.groupId,
        sex: a.sex,
        birthDate: a.birthDate,
        bodyMassKg: a.bodyMassKg,
        vmaxMs: c.vmax,
        vmaxTestedOn: a.vmaxTestedOn,
        tauS: a.tauS,
        stepLengthM: a.stepLengthM,
        plyoLevel: a.plyoLevel,
      },
    });
  } else {
    await updateTeamLoadSettings({
      teamId: team.teamId,
      input: { acwrMethod: c.method, missingLogs: c.missingLogs, hsrSpeedMs: c.hsr },
    });
  }
}

const done = new Map<string, number>();
const refused: string[] = [];

describe("load ledger through the real writers", () => {
  it("after any sequence of writes the ledger equals a rebuild from scratch and nothing is left marked", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(command, { minLength: 1, maxLength: 8 }), async (commands) => {
        for (const c of commands) {
          try {
            await run(c);
            done.set(c.kind, (done.get(c.kind) ?? 0) + 1);
          } catch (err) {
            refused.push(`${c.kind}: ${(err as Error).message}`);
            // A refused write (a restriction, a conflict) must leave the ledger as it was: still checked below.
            if (!(err instanceof Error && "status" in err)) throw err;
          }
        }
        expect(await ledgerHasMarks({})).toBe(false);
        const stored = await snapshot();
        await rebuildLedger();
        expect(await snapshot()).toEqual(stored);
      }),
      { numRuns: 40 },
    );
    // The sequences reached every kind of write (not only refusals).
    for (const kind of ["create", "move", "log", "profile", "settings"]) expect(done.get(kind) ?? 0).toBeGreaterThan(0);
  }, 600_000);
});
