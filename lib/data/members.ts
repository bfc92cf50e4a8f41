import "server-only";
import { Op } from "sequelize";
import { AppError } from "@/lib/errors";
import { newToken } from "@/lib/auth/tokens";
import type { Role } from "@/lib/auth/roles";
import type { AddMemberInput } from "@/lib/validations/members";
import { db } from "@/models";
import { memberInvitationEmail } from "@/emails/member-invitation";
import { appUrl } from "@/lib/env";
import { grantMembership, openInvitationByToken, spendTeamInvitations } from "./invitations";
import { enqueueMail } from "./outbox";
import { hashPassword, replacePassword } from "./users";

const INVITE_DAYS = 7;

export type MemberRow = {
  membershipId: number;
  userId: number;
  name: string;
  email: string;
  role: Role;
  athleteId: number | null;
};

/** Members who accepted (invitations are listed apart, by the address the team typed: listInvitations). */
export async function listMembers({ teamId }: { teamId: number }): Promise<MemberRow[]> {
  const { Membership, User, Athlete } = await db();
  const rows = await Membership.findAll({
    where: { teamId },
    attributes: ["id", "userId", "role"],
    include: [{ model: User, as: "user", attributes: ["id", "name", "email"] }],
    order: [
      ["role", "ASC"],
      ["id", "ASC"],
    ],
  });
  const athletes = await Athlete.findAll({
    where: { teamId, userId: { [Op.ne]: null } },
    attributes: ["id", "userId"],
  });
  return rows.map((m) => {
    const user = m.user!;
    return {
      membershipId: m.id,
      userId: user.id,
      name: user.name,
      email: user.email,
      role: m.role,
      athleteId: athletes.find((a) => a.userId === user.id)?.id ?? null,
    };
  });
}

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
  const { sequelize, User, Membership, Athlete, Invitation, Team } = await db();
  return sequelize.transaction(async (transaction) => {
    const [user] = await User.findOrCreate({
      where: { email: input.email },
      defaults: { email: input.email, name: input.name, passwordHash: null },
      attributes: ["id", "email", "passwordHash"],
      transaction,
    });
    const existing = await Membership.findOne({ where: { teamId, userId: user.id }, attributes: ["id"], transaction });
    if (existing)
      throw new AppError("conflict", "This person is already a member", {
        fields: { email: ["Already a member of this team"] },
      });

    let athleteId: number | null = null;
    if (input.role === "athlete") {
      if (input.athleteId) {
        const athlete = await Athlete.findOne({
          where: { id: input.athleteId, teamId },
          attributes: ["id", "userId"],
          transaction,
        });
        if (!athlete)
          throw new AppError("invalid", "Choose an athlete of this team", {
            fields: { athleteId: ["Unknown athlete"] },
          });
        if (athlete.userId)
          throw new AppError("conflict", "That athlete already has an account", {
            fields: { athleteId: ["Already linked"] },
          });
        athleteId = athlete.id;
      } else {
        athleteId = (
          await Athlete.create(
            {
              teamId,
              userId: null,
              name: input.name,
              groupId: null,
              sex: null,
              birthDate: null,
              bodyMassKg: null,
              vmaxMs: null,
              vmaxTestedOn: null,
              tauS: null,
              stepLengthM: null,
            },
            { transaction },
          )
        ).id;
      }
    }

    // A new invitation replaces any earlier one to the same account (sending again after it expired, say).
    await spendTeamInvitations({ teamId, userId: user.id, transaction, now });
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + INVITE_DAYS * 86_400_000);
    const invitation = await Invitation.create(
      {
        teamId,
        userId: user.id,
        purpose: "invite",
        email: input.email,
        name: input.name,
        role: input.role,
        athleteId,
        tokenHash: hash,
        expiresAt,
        usedAt: null,
      },
      { transaction },
    );
    const team = await Team.findByPk(teamId, { attributes: ["name", "timeZone"], transaction });
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
        existingAccount: user.passwordHash !== null,
      }),
    });
    return { invitationId: invitation.id, userId: user.id, athleteId, inviteToken: token };
  });
}

/** Who the invitation mail names: the inviting member, else the team's first head coach. */
async function inviterNameFor({
  teamId,
  invitedBy,
  transaction,
}: {
  teamId: number;
  invitedBy?: number;
  transaction: import("sequelize").Transaction;
}): Promise<string> {
  const { User, Membership } = await db();
  const userId =
    invitedBy ??
    (
      await Membership.findOne({
        where: { teamId, role: "head_coach" },
        attributes: ["userId"],
        order: [["id", "ASC"]],
        transaction,
      })
    )?.userId;
  const user = userId ? await User.findByPk(userId, { attributes: ["name"], transaction }) : null;
  return user?.name ?? "Your coach";
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
  const { sequelize, Membership } = await db();
  return sequelize.transaction(async (transaction) => {
    const membership = await Membership.findOne({ where: { id: membershipId, teamId }, transaction });
    if (!membership) throw new AppError("not_found", "No such member");
    if (membership.role === "head_coach" && role !== "head_coach")
      await assertAnotherHeadCoach({ teamId, membershipId, transaction });
    await membership.update({ role }, { transaction });
    return { membershipId, role };
  });
}

export async function removeMember({ teamId, membershipId }: { teamId: number; membershipId: number }) {
  const { sequelize, Membership, Athlete } = await db();
  return sequelize.transaction(async (transaction) => {
    const membership = await Membership.findOne({ where: { id: membershipId, teamId }, transaction });
    if (!membership) throw new AppError("not_found", "No such member");
    if (membership.role === "head_coach") await assertAnotherHeadCoach({ teamId, membershipId, transaction });
    // The athlete's training history stays with the team; only the login link goes.
    await Athlete.update({ userId: null }, { where: { teamId, userId: membership.userId }, transaction });
    await membership.destroy({ transaction });
    return { membershipId };
  });
}

async function assertAnotherHeadCoach({
  teamId,
  membershipId,
  transaction,
}: {
  teamId: number;
  membershipId: number;
  transaction: import("sequelize").Transaction;
}) {
  const { Membership } = await db();
  const others = await Membership.count({
    where: { teamId, role: "head_coach", id: { [Op.ne]: membershipId } },
    transaction,
  });
  if (others === 0)
    throw new AppError("conflict", "A team needs at least one head coach", {
      fields: { role: ["Keep at least one head coach"] },
    });
}

/** Looks up an unused, unexpired link by its token (for the invitation page). */
export async function findOpenInvitation({ token }: { token: string }) {
  const { User, Team } = await db();
  const invitation = await openInvitationByToken({ token });
  if (!invitation) return null;
  const [user, team] = await Promise.all([
    User.findByPk(invitation.userId, { attributes: ["name", "email", "passwordHash"] }),
    Team.findByPk(invitation.teamId, { attributes: ["name"] }),
  ]);
  return {
    userId: invitation.userId,
    // An invitation greets with the name the inviting team typed, never the account's own.
    name: invitation.purpose === "invite" ? (invitation.name ?? "") : (user?.name ?? ""),
    email: user?.email ?? "",
    teamName: team?.name ?? "",
    role: (invitation.role ?? null) as Role | null,
    purpose: invitation.purpose,
    /** An invitation to an account that can sign in already: accepted by its signed-in owner (joinTeam). */
    hasPassword: Boolean(user?.passwordHash),
  };
}

/**
 * Sets the password and spends the token, atomically, so a link works exactly once. An invitation sets the
 * first password of a new account and makes it a member; it never changes the password of an account that has
 * one (that account's owner signs in and accepts instead).
 */
export async function acceptInvitation({ token, password }: { token: string; password: string }) {
  const { sequelize, User } = await db();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const invitation = await openInvitationByToken({ token, transaction });
    if (!invitation)
      throw new AppError("invalid", "This link has expired or was already used", {
        fields: { token: ["Expired or used"] },
      });
    if (invitation.purpose === "invite") {
      const user = await User.findByPk(invitation.userId, { attributes: ["passwordHash"], transaction });
      if (user?.passwordHash)
        throw new AppError("invalid", "This account has a password already: sign in and accept the invitation", {
          fields: { token: ["Sign in to accept"] },
        });
      await grantMembership({ invitation, transaction });
    }
    await invitation.update({ usedAt: new Date() }, { transaction });
    return replacePassword({ userId: invitation.userId, password, passwordHash, transaction });
  });
}
