import "server-only";
import { Op, type Transaction } from "sequelize";
import { db } from "@/models";

// Rows behind a forgotten-password request; the workflow (rules, link, e-mail) is lib/services/password-reset.ts.

export type ResettableAccount = {
  userId: number;
  name: string;
  email: string;
  teamId: number;
  timeZone: string | null;
};

/** The account with this address if it can sign in and belongs to a team (its first), else null. */
export async function findResettableAccount({
  email,
  transaction,
}: {
  email: string;
  transaction: Transaction;
}): Promise<ResettableAccount | null> {
  const { User, Membership, Team } = await db();
  const user = await User.findOne({
    where: { email: email.trim().toLowerCase() },
    attributes: ["id", "name", "email", "passwordHash"],
    transaction,
  });
  if (!user?.passwordHash) return null;
  const membership = await Membership.findOne({
    where: { userId: user.id },
    attributes: ["teamId"],
    order: [["id", "ASC"]],
    transaction,
  });
  if (!membership) return null;
  const team = await Team.findByPk(membership.teamId, { attributes: ["timeZone"], transaction });
  return {
    userId: user.id,
    name: user.name,
    email: user.email,
    teamId: membership.teamId,
    timeZone: team?.timeZone ?? null,
  };
}

/** Unused reset links of the account created after `since`. */
export async function countResetLinksSince({
  userId,
  since,
  transaction,
}: {
  userId: number;
  since: Date;
  transaction: Transaction;
}): Promise<number> {
  const { Invitation } = await db();
  return Invitation.count({
    where: { userId, purpose: "reset", usedAt: null, createdAt: { [Op.gt]: since } },
    transaction,
  });
}

export async function insertResetLink({
  teamId,
  userId,
  tokenHash,
  expiresAt,
  transaction,
}: {
  teamId: number;
  userId: number;
  tokenHash: string;
  expiresAt: Date;
  transaction: Transaction;
}): Promise<void> {
  const { Invitation } = await db();
  await Invitation.create({ teamId, userId, purpose: "reset", tokenHash, expiresAt, usedAt: null }, { transaction });
}
