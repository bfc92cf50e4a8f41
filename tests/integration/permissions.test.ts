import { describe, expect, it } from "vitest";
import { authorizeAthlete, authorizeTeam } from "@/lib/auth/authorize";
import { AppError } from "@/lib/errors";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const ath = (team: typeof a, email: string) => team.users[email];
const adaA = ath(a, "ada@alphatrack.test");
const benA = ath(a, "ben@alphatrack.test");
const adaB = ath(b, "ada@bravotrack.test");

async function status(p: Promise<unknown>): Promise<number> {
  try {
    await p;
    return 200;
  } catch (err) {
    if (err instanceof AppError) return err.status;
    throw err;
  }
}

describe("team access, role by role", () => {
  it.each([
    ["head_coach", "members:manage", 200],
    ["coach", "members:manage", 403],
    ["physio", "members:manage", 403],
    ["physio", "load:view", 200],
    ["physio", "plan:edit", 403],
    ["coach", "plan:edit", 200],
    ["head_coach", "settings:edit", 200],
    ["coach", "settings:edit", 403],
  ] as const)("%s → %s answers %i", async (role, can, expected) => {
    expect(await status(authorizeTeam({ userId: a.users[role].userId, teamId: a.teamId, can }))).toBe(expected);
  });

  it("refuses an athlete squad-wide views but allows their own scope", async () => {
    expect(await status(authorizeTeam({ userId: adaA.userId, teamId: a.teamId, can: "load:view" }))).toBe(403);
    expect(await status(authorizeTeam({ userId: adaA.userId, teamId: a.teamId, can: "athletes:view" }))).toBe(403);
    expect(await status(authorizeTeam({ userId: adaA.userId, teamId: a.teamId, can: "load:view", scope: "own" }))).toBe(
      200,
    );
  });

  it("shows a user of team A nothing of team B (404, not 403)", async () => {
    for (const role of ["head_coach", "coach", "physio"] as const) {
      expect(await status(authorizeTeam({ userId: a.users[role].userId, teamId: b.teamId, can: "team:view" }))).toBe(
        404,
      );
      expect(
        await status(authorizeAthlete({ userId: a.users[role].userId, athleteId: adaB.athleteId!, can: "load:view" })),
      ).toBe(404);
    }
  });

  it("requires a signed-in user", async () => {
    expect(await status(authorizeTeam({ userId: null, teamId: a.teamId, can: "team:view" }))).toBe(401);
  });
});

describe("athlete access", () => {
  it("lets an athlete read their own load and log their own sessions", async () => {
    const viewer = await authorizeAthlete({ userId: adaA.userId, athleteId: adaA.athleteId!, can: "load:view" });
    expect(viewer.athlete.id).toBe(adaA.athleteId);
    expect(await status(authorizeAthlete({ userId: adaA.userId, athleteId: adaA.athleteId!, can: "log:write" }))).toBe(
      200,
    );
  });

  it("does not let an athlete read another athlete", async () => {
    expect(await status(authorizeAthlete({ userId: adaA.userId, athleteId: benA.athleteId!, can: "load:view" }))).toBe(
      404,
    );
    expect(
      await status(authorizeAthlete({ userId: adaA.userId, athleteId: benA.athleteId!, can: "athletes:view" })),
    ).toBe(404);
  });

  it("lets staff of the team read any athlete, and a physio not edit the plan", async () => {
    expect(
      await status(authorizeAthlete({ userId: a.users.physio.userId, athleteId: benA.athleteId!, can: "load:view" })),
    ).toBe(200);
    expect(
      await status(authorizeAthlete({ userId: a.users.physio.userId, athleteId: benA.athleteId!, can: "plan:edit" })),
    ).toBe(403);
  });

  it("re-reads the role from the database: a removed member loses access at once", async () => {
    await d.Membership.destroy({ where: { id: b.users.coach.membershipId } });
    expect(await status(authorizeTeam({ userId: b.users.coach.userId, teamId: b.teamId, can: "plan:view" }))).toBe(404);
  });
});
