import { describe, expect, it } from "vitest";
import { findOpenInvitation, listMembers } from "@/lib/data/members";
import { acceptInvitation } from "@/lib/services/invitations";
import { addMember, changeMemberRole, removeMember } from "@/lib/services/members";
import { listMembershipsOfUser, verifyCredentials } from "@/lib/data/users";
import { AppError } from "@/lib/errors";
import { addMemberSchema } from "@/lib/validations/members";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const team = await createTestTeam(d, { name: "Members Club" });

describe("members", () => {
  it("never returns a password hash", async () => {
    const members = await listMembers({ teamId: team.teamId });
    expect(members).toHaveLength(5);
    expect(JSON.stringify(members)).not.toMatch(/\$2[aby]\$/);
    expect(Object.keys(members[0]).sort()).toEqual(["athleteId", "email", "membershipId", "name", "role", "userId"]);
  });

  it("invites a member with a one-time link that sets the password exactly once and makes them a member", async () => {
    const input = addMemberSchema.parse({ name: "Nia Newcomer", email: "NIA@members.test ", role: "coach" });
    const { inviteToken, userId } = await addMember({ teamId: team.teamId, input });
    expect(inviteToken).toMatch(/^[A-Za-z0-9_-]{40,}$/);
    expect(await findOpenInvitation({ token: inviteToken! })).toMatchObject({
      email: "nia@members.test",
      teamName: "Members Club",
    });
    expect(await verifyCredentials({ email: "nia@members.test", password: "a-good-password" })).toBeNull();
    expect(await listMembershipsOfUser({ userId })).toEqual([]);
    await acceptInvitation({ token: inviteToken!, password: "a-good-password" });
    expect(await verifyCredentials({ email: "nia@members.test", password: "a-good-password" })).toMatchObject({
      id: userId,
    });
    await expect(acceptInvitation({ token: inviteToken!, password: "another-password" })).rejects.toMatchObject({
      status: 400,
    });
    expect(await listMembershipsOfUser({ userId })).toEqual([
      { teamId: team.teamId, teamName: "Members Club", role: "coach", athleteId: null },
    ]);
  });

  it("creates an athlete profile for a new athlete member", async () => {
    const input = addMemberSchema.parse({ name: "Ola Runner", email: "ola@members.test", role: "athlete" });
    const { athleteId } = await addMember({ teamId: team.teamId, input });
    expect((await d.Athlete.findByPk(athleteId!))?.name).toBe("Ola Runner");
  });

  it("refuses a duplicate member with the field that is wrong", async () => {
    const input = addMemberSchema.parse({ name: "Again", email: "nia@members.test", role: "physio" });
    await expect(addMember({ teamId: team.teamId, input })).rejects.toMatchObject({
      status: 409,
      fields: { email: ["Already a member of this team"] },
    });
  });

  it("gives field messages for bad input", () => {
    const parsed = addMemberSchema.safeParse({ name: "", email: "not-an-email", role: "owner" });
    expect(parsed.success).toBe(false);
    const fields = parsed.error!.issues.map((i) => i.path.join("."));
    expect(fields.sort()).toEqual(["email", "name", "role"]);
  });

  it("keeps at least one head coach", async () => {
    const head = (await listMembers({ teamId: team.teamId })).find((m) => m.role === "head_coach")!;
    await expect(
      changeMemberRole({ teamId: team.teamId, membershipId: head.membershipId, role: "coach" }),
    ).rejects.toBeInstanceOf(AppError);
    await expect(removeMember({ teamId: team.teamId, membershipId: head.membershipId })).rejects.toMatchObject({
      status: 409,
    });
  });

  it("removes a member but keeps their athlete history", async () => {
    const ada = team.users["ada@membersclub.test"];
    const member = (await listMembers({ teamId: team.teamId })).find((m) => m.userId === ada.userId)!;
    await removeMember({ teamId: team.teamId, membershipId: member.membershipId });
    expect((await d.Athlete.findByPk(ada.athleteId!))?.userId).toBeNull();
  });

  it("cannot touch another team's membership", async () => {
    const other = await createTestTeam(d, { name: "Other Club" });
    await expect(
      changeMemberRole({ teamId: team.teamId, membershipId: other.users.coach.membershipId, role: "physio" }),
    ).rejects.toMatchObject({ status: 404 });
  });
});
