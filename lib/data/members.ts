import "server-only";
import { Op } from "sequelize";
import { AppError } from "@/lib/errors";
import { hashToken, newToken } from "@/lib/auth/tokens";
import type { Role } from "@/lib/auth/roles";
import type { AddMemberInput } from "@/lib/validations/members";
import { db } from "@/models";
import { memberInvitationEmail } from "@/emails/member-invitation";
import { appUrl } from "@/lib/env";
import { enqueueMail } from "./outbox";
import { hashPassword } from "./users";

const INVITE_DAYS = 7;

export type MemberRow = {
  membershipId: number;
  userId: number;
  name: string;
  email: string;
  role: Role;
  athleteId: number | null;
  status: "active" | "invited";
};

export async function listMembers({ teamId }: { teamId: number }): Promise<MemberRow[]> {
  const { Membership, User, Athlete } = await db();
  const rows = await Membership.findAll({
    where: { teamId },
    attributes: ["id", "userId", "role"],
    include: [{ model: User, as: "user", attributes: ["id", "name", "email", "passwordHash"] }],
    order: [["role", "ASC"], ["id", "ASC"]],
  });
  const athletes = await Athlete.findAll({ where: { teamId, userId: { [Op.ne]: null } }, attributes: ["id", "userId"] });
  return rows.map((m) => {
    const user = (m as unknown as { user: { id: number; name: string; email: string; passwordHash: string | null } }).user;
    return {
      membershipId: m.id,
      userId: user.id,
      name: user.name,
      email: user.email,
      role: m.role,
      athleteId: athletes.find((a) => a.userId === user.id)?.id ?? null,
      // The hash itself never leaves this function; only whether one is set.
      status: user.passwordHash ? "active" : "invited",
    };
  });
}

/**
 * Adds a member, creating the user account if needed. A new account also gets a one-time link for setting a
 * password, e-mailed through the outbox in the same transaction; the token is returned too (development shows it).
 */
export async function addMember({ teamId, input, invitedBy }: { teamId: number; input: AddMemberInput; invitedBy?: number }) {
  const { sequelize, User, Membership, Athlete, Invitation, Team } = await db();
  return sequelize.transaction(async (transaction) => {
    const [user] = await User.findOrCreate({
      where: { email: input.email },
      defaults: { email: input.email, name: input.name, passwordHash: null },
      transaction,
    });
    const existing = await Membership.findOne({ where: { teamId, userId: user.id }, transaction });
    if (existing) throw new AppError("conflict", "This person is already a member", { fields: { email: ["Already a member of this team"] } });
    const membership = await Membership.create({ teamId, userId: user.id, role: input.role }, { transaction });

    let athleteId: number | null = null;
    if (input.role === "athlete") {
      if (input.athleteId) {
        const athlete = await Athlete.findOne({ where: { id: input.athleteId, teamId }, transaction });
        if (!athlete) throw new AppError("invalid", "Choose an athlete of this team", { fields: { athleteId: ["Unknown athlete"] } });
        if (athlete.userId) throw new AppError("conflict", "That athlete already has an account", { fields: { athleteId: ["Already linked"] } });
        await athlete.update({ userId: user.id }, { transaction });
        athleteId = athlete.id;
      } else {
        athleteId = (await Athlete.create({ teamId, userId: user.id, name: input.name, groupId: null, sex: null, birthDate: null, bodyMassKg: null, vmaxMs: null, vmaxTestedOn: null, tauS: null, stepLengthM: null }, { transaction })).id;
      }
    }

    let inviteToken: string | null = null;
    if (!user.passwordHash) {
      const { token, hash } = newToken();
      const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
      await Invitation.create({ teamId, userId: user.id, purpose: "invite", tokenHash: hash, expiresAt, usedAt: null }, { transaction });
      inviteToken = token;
      const team = await Team.findByPk(teamId, { attributes: ["name", "timeZone"], transaction });
      const inviterName = await inviterNameFor({ teamId, invitedBy, transaction });
      await enqueueMail({
        transaction,
        teamId,
        kind: "invitation",
        to: user.email,
        mail: memberInvitationEmail({ inviteeName: user.name, teamName: team?.name ?? "your team", role: input.role, inviterName, acceptUrl: `${appUrl()}/invite/${token}`, expiresAt, timeZone: team?.timeZone }),
      });
    }
    return { membershipId: membership.id, userId: user.id, athleteId, inviteToken };
  });
}

/** Who the invitation mail names: the inviting member, else the team's first head coach. */
async function inviterNameFor({ teamId, invitedBy, transaction }: { teamId: number; invitedBy?: number; transaction: import("sequelize").Transaction }): Promise<string> {
  const { User, Membership } = await db();
  const userId =
    invitedBy ?? (await Membership.findOne({ where: { teamId, role: "head_coach" }, attributes: ["userId"], order: [["id", "ASC"]], transaction }))?.userId;
  const user = userId ? await User.findByPk(userId, { attributes: ["name"], transaction }) : null;
  return user?.name ?? "Your coach";
}

export async function changeMemberRole({ teamId, membershipId, role }: { teamId: number; membershipId: number; role: Role }) {
  const { sequelize, Membership } = await db();
  return sequelize.transaction(async (transaction) => {
    const membership = await Membership.findOne({ where: { id: membershipId, teamId }, transaction });
    if (!membership) throw new AppError("not_found", "No such member");
    if (membership.role === "head_coach" && role !== "head_coach") await assertAnotherHeadCoach({ teamId, membershipId, transaction });
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

async function assertAnotherHeadCoach({ teamId, membershipId, transaction }: { teamId: number; membershipId: number; transaction: import("sequelize").Transaction }) {
  const { Membership } = await db();
  const others = await Membership.count({ where: { teamId, role: "head_coach", id: { [Op.ne]: membershipId } }, transaction });
  if (others === 0) throw new AppError("conflict", "A team needs at least one head coach", { fields: { role: ["Keep at least one head coach"] } });
}

/** Looks up an unused, unexpired invitation by its token (for the set-password page). */
export async function findOpenInvitation({ token }: { token: string }) {
  const { Invitation, User, Team } = await db();
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    attributes: ["id", "userId", "teamId", "purpose"],
  });
  if (!invitation) return null;
  const [user, team] = await Promise.all([
    User.findByPk(invitation.userId, { attributes: ["name", "email"] }),
    Team.findByPk(invitation.teamId, { attributes: ["name"] }),
  ]);
  return { name: user?.name ?? "", email: user?.email ?? "", teamName: team?.name ?? "", purpose: invitation.purpose };
}

/** Sets the password and spends the token, atomically, so a link works exactly once. */
export async function acceptInvitation({ token, password }: { token: string; password: string }) {
  const { sequelize, Invitation, User } = await db();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
    });
    if (!invitation) throw new AppError("invalid", "This link has expired or was already used", { fields: { token: ["Expired or used"] } });
    await invitation.update({ usedAt: new Date() }, { transaction });
    await User.update({ passwordHash }, { where: { id: invitation.userId }, transaction });
    const user = await User.findByPk(invitation.userId, { attributes: ["email"], transaction });
    return { email: user?.email ?? "" };
  });
}
