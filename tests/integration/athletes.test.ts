import { describe, expect, it } from "vitest";
import { getAthlete, listSquad } from "@/lib/data/athletes";
import { createAthlete, updateAthlete } from "@/lib/services/athletes";
import { athleteSchema } from "@/lib/validations/athlete";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const a = await createTestTeam(d, { name: "Squad One" });
const b = await createTestTeam(d, { name: "Squad Two" });

const base = {
  name: "Tess Tempo",
  groupId: "",
  sex: "",
  birthDate: "",
  bodyMassKg: "",
  vmaxMs: "9.4",
  vmaxTestedOn: "2026-10-06",
  tauS: "1.1",
  stepLengthM: "",
  plyoLevel: "beginner",
};

describe("athlete profiles", () => {
  it("parses form strings into numbers and nulls", () => {
    expect(athleteSchema.parse(base)).toMatchObject({
      vmaxMs: 9.4,
      tauS: 1.1,
      stepLengthM: null,
      groupId: null,
      sex: null,
      birthDate: null,
    });
  });

  it("names the field that is out of range", () => {
    const r = athleteSchema.safeParse({ ...base, vmaxMs: "40", tauS: "abc", vmaxTestedOn: "06/10/2026" });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path[0]).sort()).toEqual(["tauS", "vmaxMs", "vmaxTestedOn"]);
  });

  it("creates and updates within the team only", async () => {
    const { id } = await createAthlete({
      teamId: a.teamId,
      input: athleteSchema.parse({ ...base, groupId: String(a.groupId) }),
    });
    expect((await getAthlete({ teamId: a.teamId, athleteId: id }))?.groupName).toBe("Sprint");
    await updateAthlete({ teamId: a.teamId, athleteId: id, input: athleteSchema.parse({ ...base, vmaxMs: "9.9" }) });
    expect((await getAthlete({ teamId: a.teamId, athleteId: id }))?.vmaxMs).toBe(9.9);
    await expect(
      updateAthlete({ teamId: b.teamId, athleteId: id, input: athleteSchema.parse(base) }),
    ).rejects.toMatchObject({ status: 404 });
    expect(await getAthlete({ teamId: b.teamId, athleteId: id })).toBeNull();
  });

  it("refuses another team's training group", async () => {
    await expect(
      createAthlete({ teamId: a.teamId, input: athleteSchema.parse({ ...base, groupId: String(b.groupId) }) }),
    ).rejects.toMatchObject({ status: 400, fields: { groupId: ["Unknown group"] } });
  });

  it("lists a squad without account details", async () => {
    const squad = await listSquad({ teamId: a.teamId });
    expect(squad.every((r) => !("userId" in r) && typeof r.hasAccount === "boolean")).toBe(true);
  });
});
