import "server-only";
import { grantMembership, markInvitationUsed, openInvitationByToken } from "@/lib/data/invitations";
import { getNoticeTeam } from "@/lib/data/notification-settings";
import { inTransaction } from "@/lib/data/transaction";
import { hasPassword, hashPassword, replacePassword } from "@/lib/data/users";
import { AppError } from "@/lib/errors";

// Accepting an invitation or a reset link: the only place a membership is created for an invitee.

/**
 * Sets the password and spends the token, atomically, so a link works exactly once. An invitation sets the
 * first password of a new account and makes it a member; it never changes the password of an account that has
 * one (that account's owner signs in and accepts instead).
 */
export async function acceptInvitation({ token, password }: { token: string; password: string }) {
  const passwordHash = await hashPassword(password);
  return inTransaction(async (transaction) => {
    const invitation = await openInvitationByToken({ token, transaction });
    if (!invitation)
      throw new AppError("invalid", "This link has expired or was already used", {
        fields: { token: ["Expired or used"] },
      });
    if (invitation.purpose === "invite") {
      if (await hasPassword({ userId: invitation.userId, transaction })) {
        throw new AppError("invalid", "This account has a password already: sign in and accept the invitation", {
          fields: { token: ["Sign in to accept"] },
        });
      }
      await grantMembership({ invitation, transaction });
    }
    await markInvitationUsed({ invitationId: invitation.id, now: new Date(), transaction });
    return replacePassword({ userId: invitation.userId, password, passwordHash, transaction });
  });
}

/**
 * An existing account accepts an invitation: only its signed-in owner may, so nobody can be put into a team
 * by someone who merely saw the link.
 */
export async function joinTeam({ token, userId, now = new Date() }: { token: string; userId: number; now?: Date }) {
  return inTransaction(async (transaction) => {
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
    await markInvitationUsed({ invitationId: invitation.id, now, transaction });
    const team = await getNoticeTeam({ teamId, transaction });
    return { teamId, teamName: team?.name ?? "" };
  });
}
