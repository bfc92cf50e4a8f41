import "server-only";
import { Op, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { hashToken } from "@/lib/auth/tokens";
import type { Role } from "@/lib/auth/roles";
import { db, type Invitation } from "@/models";

export type InvitationRow = {
  invitationId: number;
  /** The address the inviting team typed; the only thing about the invitee it sees until they accept. */
  email: string;
  role: Role;
  status: "invited" | "expired";
  expiresAt: string;
};

/** The team's invitations nobody accepted or withdrew yet, newest first (expired ones too, to send again). */
export async function listInvitations({
  teamId,
  now = new Date(),
}: {
  teamId: number;
  now?: Date;
}): Promise<InvitationRow[]> {
  const { Invitation } = await db();
  const rows = await Invitation.findAll({
    where: { teamId, purpose: "invite", usedAt: null, role: { [Op.ne]: null } },
    attributes: ["id", "email", "role", "expiresAt"],
    order: [["id", "DESC"]],
  });
  return rows.map((i) => ({
    invitationId: i.id,
    email: i.email ?? "",
    role: i.role as Role,
    status: i.expiresAt > now ? "invited" : "expired",
    expiresAt: i.expiresAt.toISOString(),
  }));
}

/** The head coach takes an invitation back: its link stops working at once. */
export async function withdrawInvitation({
  teamId,
  invitationId,
  now = new Date(),
}: {
  teamId: number;
  invitationId: number;
  now?: Date;
}) {
  const { Invitation } = await db();
  const [count] = await Invitation.update(
    { usedAt: now },
    { where: { id: invitationId, teamId, purpose: "invite", usedAt: null } },
  );
  if (count !== 1) throw new AppError("not_found", "No such invitation");
  return { invitationId };
}

/** Spends every open invitation of this account to this team (a new one replaces them). */
export async function spendTeamInvitations({
  teamId,
  userId,
  transaction,
  now = new Date(),
}: {
  teamId: number;
  userId: number;
  transaction: Transaction;
  now?: Date;
}) {
  const { Invitation } = await db();
  await Invitation.update({ usedAt: now }, { where: { teamId, userId, purpose: "invite", usedAt: null }, transaction });
}

/** The unused, unexpired link with this token, locked to the caller's transaction when given. */
export async function openInvitationByToken({
  token,
  transaction,
  now = new Date(),
}: {
  token: string;
  transaction?: Transaction;
  now?: Date;
}): Promise<Invitation | null> {
  const { Invitation } = await db();
  return Invitation.findOne({
    where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
  });
}

/**
 * Turns an accepted invitation into a membership (the only place one is created for an invitee) and links
 * the athlete profile the team prepared, unless someone else took it meanwhile.
 */
export async function grantMembership({
  invitation,
  transaction,
}: {
  invitation: Invitation;
  transaction: Transaction;
}): Promise<{ teamId: number }> {
  const { Membership, Athlete } = await db();
  const { teamId, userId, role } = invitation;
  if (!role)
    throw new AppError("invalid", "This invitation no longer works. Ask your head coach for a new one.", {
      fields: { token: ["Expired or used"] },
    });
  const existing = await Membership.findOne({ where: { teamId, userId }, attributes: ["id"], transaction });
  if (!existing) await Membership.create({ teamId, userId, role }, { transaction });
  if (role === "athlete") {
    const linked = await Athlete.findOne({ where: { teamId, userId }, attributes: ["id"], transaction });
    if (!linked) {
      const profile = invitation.athleteId
        ? await Athlete.findOne({ where: { id: invitation.athleteId, teamId, userId: null }, transaction })
        : null;
      if (profile) await profile.update({ userId }, { transaction });
      else
        await Athlete.create(
          {
            teamId,
            userId,
            name: invitation.name ?? "New athlete",
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
        );
    }
  }
  return { teamId };
}

/**
 * An existing account accepts an invitation: only its signed-in owner may, so nobody can be put into a team
 * by someone who merely saw the link.
 */
export async function joinTeam({ token, userId, now = new Date() }: { token: string; userId: number; now?: Date }) {
  const { sequelize, Team } = await db();
  return sequelize.transaction(async (transaction) => {
    const invitation = await openInvitationByToken({ token, transaction, now });
    if (!invitation || invitation.purpose !== "invite")
      throw new AppError("invalid", "This invitation has expired or was already used", {
        fields: { token: ["Expired or used"] },
      });
    if (invitation.userId !== userId)
      throw new AppError(
        "forbidden",
        "This invitation is for another account. Sign in with the address it was sent to.",
      );
    const { teamId } = await grantMembership({ invitation, transaction });
    await invitation.update({ usedAt: now }, { transaction });
    const team = await Team.findByPk(teamId, { attributes: ["name"], transaction });
    return { teamId, teamName: team?.name ?? "" };
  });
}
