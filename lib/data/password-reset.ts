import "server-only";
import { Op } from "sequelize";
import { passwordResetEmail } from "@/emails/password-reset";
import { newToken } from "@/lib/auth/tokens";
import { appUrl } from "@/lib/env";
import { db } from "@/models";
import { enqueueMail } from "./outbox";

const RESET_MINUTES = 60;
/** One reset mail per account in this window, so the form cannot be used to flood someone's inbox. */
const RESEND_MINUTES = 2;

/**
 * Queues a one-time reset link for an account that can sign in. Answers the same whether or not the e-mail is
 * known, so the form does not reveal who has an account. The link is spent by acceptInvitation.
 */
export async function requestPasswordReset({ email, now = new Date() }: { email: string; now?: Date }): Promise<void> {
  const { sequelize, User, Membership, Invitation, Team } = await db();
  await sequelize.transaction(async (transaction) => {
    const user = await User.findOne({
      where: { email: email.trim().toLowerCase() },
      attributes: ["id", "name", "email", "passwordHash"],
      transaction,
    });
    if (!user?.passwordHash) return;
    const membership = await Membership.findOne({
      where: { userId: user.id },
      attributes: ["teamId"],
      order: [["id", "ASC"]],
      transaction,
    });
    if (!membership) return;
    const recent = await Invitation.count({
      where: {
        userId: user.id,
        purpose: "reset",
        usedAt: null,
        createdAt: { [Op.gt]: new Date(now.getTime() - RESEND_MINUTES * 60_000) },
      },
      transaction,
    });
    if (recent > 0) return;
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + RESET_MINUTES * 60_000);
    await Invitation.create(
      { teamId: membership.teamId, userId: user.id, purpose: "reset", tokenHash: hash, expiresAt, usedAt: null },
      { transaction },
    );
    const team = await Team.findByPk(membership.teamId, { attributes: ["timeZone"], transaction });
    await enqueueMail({
      transaction,
      teamId: membership.teamId,
      kind: "password_reset",
      to: user.email,
      mail: passwordResetEmail({
        name: user.name,
        resetUrl: `${appUrl()}/invite/${token}`,
        expiresAt,
        timeZone: team?.timeZone,
      }),
    });
  });
}
