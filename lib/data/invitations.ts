import "server-only";
import { Op, type InferAttributes, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { hashToken } from "@/lib/auth/tokens";
import type { Role } from "@/lib/auth/roles";
import { db, type Invitation } from "@/models";
import { insertAthleteProfile } from "./athletes";

/** An unused, unexpired link as the accept steps read it. */
export type OpenInvitation = Pick<
  InferAttributes<Invitation>,
  "id" | "teamId" | "userId" | "purpose" | "role" | "athleteId" | "name"
>;

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
}): Promise<OpenInvitation | null> {
  const { Invitation } = await db();
  const row = await Invitation.findOne({
    where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: now } },
    attributes: ["id", "teamId", "userId", "purpose", "role", "athleteId", "name"],
    transaction,
  });
  if (!row) return null;
  const { id, teamId, userId, purpose, role, athleteId, name } = row;
  return { id, teamId, userId, purpose, role, athleteId, name };
}

/** Spends a link (it works once). */
export async function markInvitationUsed({
  invitationId,
  now,
  transaction,
}: {
  invitationId: number;
  now: Date;
  transaction: Transaction;
}): Promise<void> {
  const { Invitation } = await db();
  await Invitation.update({ usedAt: now }, { where: { id: invitationId }, transaction });
}

/** An invitation to the team; its id. */
export async function insertInvitation({
  transaction,
  ...values
}: {
  transaction: Transaction;
  teamId: number;
  userId: number;
  email: string;
  name: string;
  role: Role;
  athleteId: number | null;
  tokenHash: string;
  expiresAt: Date;
}): Promise<number> {
  const { Invitation } = await db();
  const row = await Invitation.create({ ...values, purpose: "invite", usedAt: null }, { transaction });
  return row.id;
}

/**
 * Turns an accepted invitation into a membership (the only place one is created for an invitee) and links
 * the athlete profile the team prepared, unless someone else took it meanwhile.
 */
export async function grantMembership({
  invitation,
  transaction,
}: {
  invitation: OpenInvitation;
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
      else await insertAthleteProfile({ teamId, userId, name: invitation.name ?? "New athlete", transaction });
    }
  }
  return { teamId };
}
