import "server-only";
import { memberInvitationEmail } from "@/emails/member-invitation";
import type { Role } from "@/lib/auth/roles";
import { newToken } from "@/lib/auth/tokens";
import { findAthleteLink, insertAthleteProfile, unlinkAthletes } from "@/lib/data/athletes";
import { insertInvitation, spendTeamInvitations } from "@/lib/data/invitations";
import {
  countOtherHeadCoaches,
  deleteMembership,
  findMembership,
  findOrCreateInvitee,
  inviterNameFor,
  isMember,
  setMembershipRole,
} from "@/lib/data/members";
import { getNoticeTeam } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { inTransaction } from "@/lib/data/transaction";
import { appUrl } from "@/lib/env";
import { AppError } from "@/lib/errors";
import type { AddMemberInput } from "@/lib/validations/members";

const INVITE_DAYS = 7;

/**
 * Invites someone to the team: an invitation e-mailed through the outbox in the same transaction, never a
 * membership. The membership exists only once the invitee accepts (a new account by choosing a password, an
 * existing one by its signed-in owner), so until then the team sees only the address it typed and the account
 * gets none of the team's data. The answer is the same whether or not the address has an account. For an
 * athlete the team's profile is prepared now (typed name or an unlinked profile) and linked on acceptance.
 * The token is returned for tests; the action never passes it on.
 */
export async function addMember({
  teamId,
  input,
  invitedBy,
  now = new Date(),
}: {
  teamId: number;
  input: AddMemberInput;
  invitedBy?: number;
  now?: Date;
}) {
  return inTransaction(async (transaction) => {
    const user = await findOrCreateInvitee({ email: input.email, name: input.name, transaction });
    if (await isMember({ teamId, userId: user.id, transaction })) {
      throw new AppError("conflict", "This person is already a member", {
        fields: { email: ["Already a member of this team"] },
      });
    }

    let athleteId: number | null = null;
    if (input.role === "athlete") {
      if (input.athleteId) {
        const athlete = await findAthleteLink({ teamId, athleteId: input.athleteId, transaction });
        if (!athlete)
          throw new AppError("invalid", "Choose an athlete of this team", {
            fields: { athleteId: ["Unknown athlete"] },
          });
        if (athlete.userId) {
          throw new AppError("conflict", "That athlete already has an account", {
            fields: { athleteId: ["Already linked"] },
          });
        }
        athleteId = athlete.id;
      } else {
        athleteId = await insertAthleteProfile({ teamId, userId: null, name: input.name, transaction });
      }
    }

    // A new invitation replaces any earlier one to the same account (sending again after it expired, say).
    await spendTeamInvitations({ teamId, userId: user.id, transaction, now });
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + INVITE_DAYS * 86_400_000);
    const invitationId = await insertInvitation({
      transaction,
      teamId,
      userId: user.id,
      email: input.email,
      name: input.name,
      role: input.role,
      athleteId,
      tokenHash: hash,
      expiresAt,
    });
    const team = await getNoticeTeam({ teamId, transaction });
    const inviterName = await inviterNameFor({ teamId, invitedBy, transaction });
    await enqueueMail({
      transaction,
      teamId,
      kind: "invitation",
      to: input.email,
      mail: memberInvitationEmail({
        inviteeName: input.name,
        teamName: team?.name ?? "your team",
        role: input.role,
        inviterName,
        acceptUrl: `${appUrl()}/invite/${token}`,
        expiresAt,
        timeZone: team?.timeZone,
        existingAccount: user.hasPassword,
      }),
    });
    return { invitationId, userId: user.id, athleteId, inviteToken: token };
  });
}

async function assertAnotherHeadCoach(args: {
  teamId: number;
  membershipId: number;
  transaction: import("sequelize").Transaction;
}) {
  if ((await countOtherHeadCoaches(args)) === 0) {
    throw new AppError("conflict", "A team needs at least one head coach", {
      fields: { role: ["Keep at least one head coach"] },
    });
  }
}

export async function changeMemberRole({
  teamId,
  membershipId,
  role,
}: {
  teamId: number;
  membershipId: number;
  role: Role;
}) {
  return inTransaction(async (transaction) => {
    const membership = await findMembership({ teamId, membershipId, transaction });
    if (!membership) throw new AppError("not_found", "No such member");
    if (membership.role === "head_coach" && role !== "head_coach")
      await assertAnotherHeadCoach({ teamId, membershipId, transaction });
    await setMembershipRole({ membershipId, role, transaction });
    return { membershipId, role };
  });
}

export async function removeMember({ teamId, membershipId }: { teamId: number; membershipId: number }) {
  return inTransaction(async (transaction) => {
    const membership = await findMembership({ teamId, membershipId, transaction });
    if (!membership) throw new AppError("not_found", "No such member");
    if (membership.role === "head_coach") await assertAnotherHeadCoach({ teamId, membershipId, transaction });
    // The athlete's training history stays with the team; only the login link goes.
    await unlinkAthletes({ teamId, userId: membership.userId, transaction });
    await deleteMembership({ membershipId, transaction });
    return { membershipId };
  });
}
