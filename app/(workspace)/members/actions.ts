"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { runAction } from "@/lib/action-result";
import { requireViewer, requireMember } from "@/lib/auth/access";
import { withdrawInvitation } from "@/lib/data/invitations";
import { addMember, changeMemberRole, removeMember } from "@/lib/services/members";
import { addMemberSchema, changeRoleSchema, type AddMemberInput } from "@/lib/validations/members";

const idSchema = z.coerce.number().int().positive();

async function headCoach() {
  const viewer = await requireViewer();
  return requireMember({ teamId: viewer.teamId, can: "members:manage" });
}

export async function addMemberAction(input: AddMemberInput) {
  return runAction(async () => {
    const viewer = await headCoach();
    const parsed = addMemberSchema.parse(input);
    await addMember({ teamId: viewer.teamId, input: parsed, invitedBy: viewer.userId });
    revalidatePath("/members");
    // The same answer whether or not the address has an account, and never the link: it belongs to the invitee.
    return { invited: true, email: parsed.email };
  });
}

export async function changeRoleAction(membershipId: number, input: { role: string }) {
  return runAction(async () => {
    const viewer = await headCoach();
    const { role } = changeRoleSchema.parse(input);
    const result = await changeMemberRole({ teamId: viewer.teamId, membershipId: idSchema.parse(membershipId), role });
    revalidatePath("/members");
    return result;
  });
}

export async function removeMemberAction(membershipId: number) {
  return runAction(async () => {
    const viewer = await headCoach();
    const result = await removeMember({ teamId: viewer.teamId, membershipId: idSchema.parse(membershipId) });
    revalidatePath("/members");
    return result;
  });
}

export async function withdrawInvitationAction(invitationId: number) {
  return runAction(async () => {
    const viewer = await headCoach();
    const result = await withdrawInvitation({ teamId: viewer.teamId, invitationId: idSchema.parse(invitationId) });
    revalidatePath("/members");
    return result;
  });
}
