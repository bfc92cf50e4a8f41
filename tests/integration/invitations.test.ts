// Adding an existing account to a team sends an invitation its owner accepts; until then the inviting team
// sees only the address it typed, and the account gets none of the team's data (issue 10, defect 8).
import { describe, expect, it } from "vitest";
import { authorizeTeam } from "@/lib/auth/authorize";
import { listInvitations, withdrawInvitation } from "@/lib/data/invitations";
import { findOpenInvitation, listMembers } from "@/lib/data/members";
import { acceptInvitation, joinTeam } from "@/lib/services/invitations";
import { addMember } from "@/lib/services/members";
import { listAlertRecipients } from "@/lib/data/notification-settings";
import { listOutbox } from "@/lib/data/outbox";
import { listMembershipsOfUser, verifyCredentials } from "@/lib/data/users";
import { addMemberSchema } from "@/lib/validations/members";
import { TEST_PASSWORD, createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const alpha = await createTestTeam(d, { name: "Alpha Track" });
const bravo = await createTestTeam(d, { name: "Bravo Track" });
const PHYSIO_A = "physio@alphatrack.test";
const physioA = alpha.users.physio!;
const bravoHead = bravo.users.head_coach!.userId;
// The account's own name, which Bravo must not learn before it joins.
await d.User.update({ name: "Orla Quennell" }, { where: { id: physioA.userId } });

const invite = (input: Record<string, unknown>, teamId = bravo.teamId, now?: Date) =>
  addMember({ teamId, input: addMemberSchema.parse(input), invitedBy: bravoHead, now });

async function status(p: Promise<unknown>): Promise<number> {
  try {
    await p;
    return 200;
  } catch (err) {
    return (err as { status?: number }).status ?? 500;
  }
}

describe("inviting an account that exists already", () => {
  const pending = invite({ name: "Someone Typed", email: PHYSIO_A, role: "physio" });

  it("makes no membership: the inviting team sees only the typed address, never the account's name", async () => {
    await pending;
    const members = await listMembers({ teamId: bravo.teamId });
    expect(members.map((m) => m.userId)).not.toContain(physioA.userId);
    expect(JSON.stringify(members)).not.toContain("Orla Quennell");
    const invitations = await listInvitations({ teamId: bravo.teamId });
    expect(invitations).toEqual([
      {
        invitationId: expect.any(Number),
        email: PHYSIO_A,
        role: "physio",
        status: "invited",
        expiresAt: expect.any(String),
      },
    ]);
    expect(JSON.stringify(invitations)).not.toContain("Orla Quennell");
  });

  it("gives the account no access to the team and no alerts from it", async () => {
    await pending;
    expect(await listMembershipsOfUser({ userId: physioA.userId })).toEqual([
      expect.objectContaining({ teamId: alpha.teamId }),
    ]);
    expect(await status(authorizeTeam({ userId: physioA.userId, teamId: bravo.teamId, can: "team:view" }))).toBe(404);
    expect((await listAlertRecipients({ teamId: bravo.teamId })).map((r) => r.email)).not.toContain(PHYSIO_A);
  });

  it("e-mails the invitation through the outbox, asking the owner to sign in", async () => {
    await pending;
    const [row] = (await listOutbox({ teamId: bravo.teamId })).filter((r) => r.toEmail === PHYSIO_A);
    expect(row).toMatchObject({ kind: "invitation", status: "pending" });
    const mail = await d.OutboxMessage.findByPk(row!.id);
    expect(mail!.text).toContain("sign in");
    expect(mail!.text).toContain("Hello Someone Typed");
  });

  it("cannot be used to set the existing account's password", async () => {
    const { inviteToken } = await pending;
    expect(await status(acceptInvitation({ token: inviteToken, password: "attacker chose this 1" }))).toBe(400);
    expect(await verifyCredentials({ email: PHYSIO_A, password: TEST_PASSWORD })).toMatchObject({ id: physioA.userId });
    expect(await verifyCredentials({ email: PHYSIO_A, password: "attacker chose this 1" })).toBeNull();
  });

  it("is accepted only by the invited account, signed in; then the account is a member and the link is spent", async () => {
    const { inviteToken } = await pending;
    expect(await findOpenInvitation({ token: inviteToken })).toMatchObject({
      hasPassword: true,
      purpose: "invite",
      role: "physio",
      teamName: "Bravo Track",
      name: "Someone Typed",
    });
    expect(await status(joinTeam({ token: inviteToken, userId: bravoHead }))).toBe(403);
    expect(await status(joinTeam({ token: inviteToken, userId: alpha.users.coach!.userId }))).toBe(403);
    expect((await listMembers({ teamId: bravo.teamId })).map((m) => m.userId)).not.toContain(physioA.userId);

    expect(await joinTeam({ token: inviteToken, userId: physioA.userId })).toEqual({
      teamId: bravo.teamId,
      teamName: "Bravo Track",
    });
    expect((await listMembers({ teamId: bravo.teamId })).find((m) => m.userId === physioA.userId)).toMatchObject({
      role: "physio",
      name: "Orla Quennell",
    });
    expect(await listInvitations({ teamId: bravo.teamId })).toEqual([]);
    expect(await status(joinTeam({ token: inviteToken, userId: physioA.userId }))).toBe(400);
    expect(await status(authorizeTeam({ userId: physioA.userId, teamId: bravo.teamId, can: "team:view" }))).toBe(200);
  });
});

describe("inviting an athlete", () => {
  it("links the team's profile only when the invitee accepts", async () => {
    const profile = await d.Athlete.create({
      teamId: bravo.teamId,
      userId: null,
      groupId: null,
      name: "Cleo Sprint",
      sex: null,
      birthDate: null,
      bodyMassKg: null,
      vmaxMs: null,
      vmaxTestedOn: null,
      tauS: null,
      stepLengthM: null,
    });
    const { inviteToken, athleteId } = await invite({
      name: "Cleo Sprint",
      email: "ada@alphatrack.test",
      role: "athlete",
      athleteId: profile.id,
    });
    expect(athleteId).toBe(profile.id);
    expect((await d.Athlete.findByPk(profile.id))!.userId).toBeNull();
    const ada = alpha.users["ada@alphatrack.test"]!;
    await joinTeam({ token: inviteToken, userId: ada.userId });
    expect((await d.Athlete.findByPk(profile.id))!.userId).toBe(ada.userId);
    // Her profile in her first team is untouched.
    expect((await d.Athlete.findByPk(ada.athleteId!))!.userId).toBe(ada.userId);
  });

  it("a new account joins, with its new profile linked, by choosing its first password", async () => {
    const { inviteToken, athleteId, userId } = await invite({
      name: "Dara New",
      email: "dara@bravo.test",
      role: "athlete",
    });
    expect((await d.Athlete.findByPk(athleteId!))!.userId).toBeNull();
    expect(await listMembershipsOfUser({ userId })).toEqual([]);
    await acceptInvitation({ token: inviteToken, password: "dara picks a good one" });
    expect((await d.Athlete.findByPk(athleteId!))!.userId).toBe(userId);
    expect(await listMembershipsOfUser({ userId })).toEqual([
      { teamId: bravo.teamId, teamName: "Bravo Track", role: "athlete", athleteId },
    ]);
  });
});

describe("invitation lifecycle", () => {
  it("an expired invitation never becomes a membership, and sending again replaces it", async () => {
    const old = await invite(
      { name: "Late Comer", email: "late@bravo.test", role: "coach" },
      bravo.teamId,
      new Date(Date.now() - 8 * 86_400_000),
    );
    expect((await listInvitations({ teamId: bravo.teamId })).find((i) => i.email === "late@bravo.test")?.status).toBe(
      "expired",
    );
    expect(await status(acceptInvitation({ token: old.inviteToken, password: "late but keen 123" }))).toBe(400);
    expect(await listMembershipsOfUser({ userId: old.userId })).toEqual([]);
    const fresh = await invite({ name: "Late Comer", email: "late@bravo.test", role: "coach" });
    expect(
      (await listInvitations({ teamId: bravo.teamId }))
        .filter((i) => i.email === "late@bravo.test")
        .map((i) => i.status),
    ).toEqual(["invited"]);
    expect(await findOpenInvitation({ token: fresh.inviteToken })).not.toBeNull();
  });

  it("a withdrawn invitation stops working; another team cannot withdraw it", async () => {
    const { invitationId, inviteToken } = await invite({
      name: "Changed Mind",
      email: "changed@bravo.test",
      role: "physio",
    });
    expect(await status(withdrawInvitation({ teamId: alpha.teamId, invitationId }))).toBe(404);
    expect(await findOpenInvitation({ token: inviteToken })).not.toBeNull();
    await withdrawInvitation({ teamId: bravo.teamId, invitationId });
    expect(await findOpenInvitation({ token: inviteToken })).toBeNull();
    expect(await status(acceptInvitation({ token: inviteToken, password: "too late for this 1" }))).toBe(400);
  });

  it("an existing member cannot be invited again", async () => {
    await expect(invite({ name: "Again", email: "head@bravotrack.test", role: "coach" })).rejects.toMatchObject({
      status: 409,
      fields: { email: ["Already a member of this team"] },
    });
  });
});
