import "server-only";
import bcrypt from "bcryptjs";
import { Op, type Transaction } from "sequelize";
import { db } from "@/models";
import type { Role } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { passwordFor } from "@/lib/validations/password";
import { endAllSessions } from "./auth-sessions";

export type MembershipSummary = { teamId: number; teamName: string; role: Role; athleteId: number | null };

let dummyHash: string | undefined;

/** Checks a password; returns the public user fields only (never the hash). */
export async function verifyCredentials({ email, password }: { email: string; password: string }) {
  const { User } = await db();
  const user = await User.findOne({
    where: { email: email.trim().toLowerCase() },
    attributes: ["id", "name", "email", "passwordHash"],
  });
  // Compare against a dummy hash when the user is unknown so timing does not reveal which e-mails exist.
  const hash = user?.passwordHash ?? (dummyHash ??= bcrypt.hashSync("no-such-user-password", 10));
  const ok = await bcrypt.compare(password, hash);
  if (!user || !user.passwordHash || !ok) return null;
  return { id: user.id, name: user.name, email: user.email };
}

export async function listMembershipsOfUser({ userId }: { userId: number }): Promise<MembershipSummary[]> {
  const { Membership, Team, Athlete } = await db();
  const rows = await Membership.findAll({
    where: { userId },
    attributes: ["teamId", "role"],
    include: [{ model: Team, as: "team", attributes: ["name"] }],
    order: [["id", "ASC"]],
  });
  const athletes = await Athlete.findAll({ where: { userId }, attributes: ["id", "teamId"] });
  return rows.map((m) => {
    const team = m.team!;
    return {
      teamId: m.teamId,
      teamName: team.name,
      role: m.role,
      athleteId: athletes.find((a) => a.teamId === m.teamId)?.id ?? null,
    };
  });
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}

/**
 * Reset links can set this account's password, so spending one spends them all. Invitations are left alone: one
 * never sets the password of an account that has one (acceptInvitation), and another team's may still be accepted.
 */
const PASSWORD_LINKS = ["reset"];

/**
 * Gives an account a new password, inside the transaction that spent the one-time link: checks the password rule
 * against the account's e-mail, spends every other outstanding reset link, and ends every
 * session of the account (a stolen cookie stops working). Hash the password before the transaction (bcrypt is slow).
 */
export async function replacePassword({
  userId,
  password,
  passwordHash,
  transaction,
  now = new Date(),
}: {
  userId: number;
  password: string;
  passwordHash: string;
  transaction: Transaction;
  now?: Date;
}) {
  const { User, Invitation } = await db();
  const user = await User.findByPk(userId, { attributes: ["id", "email"], transaction });
  if (!user)
    throw new AppError("invalid", "This link has expired or was already used", {
      fields: { token: ["Expired or used"] },
    });
  const checked = passwordFor(user.email).safeParse(password);
  if (!checked.success) {
    const messages = checked.error.issues.map((i) => i.message);
    throw new AppError("invalid", messages[0], { fields: { password: messages } });
  }
  await User.update({ passwordHash }, { where: { id: userId }, transaction });
  await Invitation.update(
    { usedAt: now },
    { where: { userId, usedAt: null, purpose: { [Op.in]: PASSWORD_LINKS } }, transaction },
  );
  await endAllSessions({ userId, transaction });
  return { email: user.email };
}

/** Display names of users by id (ids may repeat or be null), for "set by" and "acknowledged by" lines. */
export async function userNames(
  ids: ReadonlyArray<number | null>,
  transaction?: Transaction,
): Promise<Map<number, string>> {
  const { User } = await db();
  const wanted = [...new Set(ids.filter((id): id is number => id !== null))];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ["id", "name"], transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** Whether the account has a password (it can sign in). */
export async function hasPassword({
  userId,
  transaction,
}: {
  userId: number;
  transaction?: Transaction;
}): Promise<boolean> {
  const { User } = await db();
  const user = await User.findByPk(userId, { attributes: ["passwordHash"], transaction });
  return Boolean(user?.passwordHash);
}
