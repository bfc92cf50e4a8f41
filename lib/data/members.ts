import "server-only";
import { Op, type Transaction } from "sequelize";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/models";
import { openInvitationByToken } from "./invitations";

// Member and membership rows. The workflows (invite, change a role, remove, accept) are lib/services/members.ts
// and lib/services/invitations.ts.

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

/** The account with this address, created without a password when there is none; whether it can sign in. */
export async function findOrCreateInvitee({
  email,
  name,
  transaction,
}: {
  email: string;
  name: string;
  transaction: Transaction;
}): Promise<{ id: number; hasPassword: boolean }> {
  const { User } = await db();
  const [user] = await User.findOrCreate({
    where: { email },
    defaults: { email, name, passwordHash: null },
    attributes: ["id", "email", "passwordHash"],
    transaction,
  });
  return { id: user.id, hasPassword: user.passwordHash !== null };
}

export async function isMember({
  teamId,
  userId,
  transaction,
}: {
  teamId: number;
  userId: number;
  transaction: Transaction;
}) {
  const { Membership } = await db();
  return (await Membership.findOne({ where: { teamId, userId }, attributes: ["id"], transaction })) !== null;
}

export async function findMembership({
  teamId,
  membershipId,
  transaction,
}: {
  teamId: number;
  membershipId: number;
  transaction: Transaction;
}): Promise<{ id: number; userId: number; role: Role } | null> {
  const { Membership } = await db();
  const m = await Membership.findOne({ where: { id: membershipId, teamId }, transaction });
  return m ? { id: m.id, userId: m.userId, role: m.role } : null;
}

/** Head coaches of the team other than this membership. */
export async function countOtherHeadCoaches({
  teamId,
  membershipId,
  transaction,
}: {
  teamId: number;
  membershipId: number;
  transaction: Transaction;
}): Promise<number> {
  const { Membership } = await db();
  return Membership.count({ where: { teamId, role: "head_coach", id: { [Op.ne]: membershipId } }, transaction });
}

export async function setMembershipRole({
  membershipId,
  role,
  transaction,
}: {
  membershipId: number;
  role: Role;
  transaction: Transaction;
}): Promise<void> {
  const { Membership } = await db();
  await Membership.update({ role }, { where: { id: membershipId }, transaction });
}

export async function deleteMembership({
  membershipId,
  transaction,
}: {
  membershipId: number;
  transaction: Transaction;
}) {
  const { Membership } = await db();
  await Membership.destroy({ where: { id: membershipId }, transaction });
}

/** Who the invitation mail names: the inviting member, else the team's first head coach. */
export async function inviterNameFor({
  teamId,
  invitedBy,
  transaction,
}: {
  teamId: number;
  invitedBy?: number;
  transaction: Transaction;
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
