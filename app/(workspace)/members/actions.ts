"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { runAction } from "@/lib/action-result";
import { requireViewer, requireMember } from "@/lib/auth/access";
import { appUrl } from "@/lib/env";
import { isFakeMailbox } from "@/lib/mail/transport";
import { addMember, changeMemberRole, removeMember } from "@/lib/data/members";
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
    const result = await addMember({ teamId: viewer.teamId, input: parsed, invitedBy: viewer.userId });
    revalidatePath("/members");
    // The invitation goes out by e-mail; the link itself is shown only while mail stays on this machine.
    const showLink = result.inviteToken !== null && isFakeMailbox();
    return { ...result, inviteToken: null, invited: result.inviteToken !== null, inviteUrl: showLink ? `${appUrl()}/invite/${result.inviteToken}` : null };
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
