import "server-only";
import { passwordResetEmail } from "@/emails/password-reset";
import { newToken } from "@/lib/auth/tokens";
import { enqueueMail } from "@/lib/data/outbox";
import { countResetLinksSince, findResettableAccount, insertResetLink } from "@/lib/data/password-reset";
import { inTransaction } from "@/lib/data/transaction";
import { appUrl } from "@/lib/env";

const RESET_MINUTES = 60;
/** One reset mail per account in this window, so the form cannot be used to flood someone's inbox. */
const RESEND_MINUTES = 2;

/**
 * Queues a one-time reset link for an account that can sign in. Answers the same whether or not the e-mail is
 * known, so the form does not reveal who has an account. The link is spent by acceptInvitation.
 */
export async function requestPasswordReset({ email, now = new Date() }: { email: string; now?: Date }): Promise<void> {
  await inTransaction(async (transaction) => {
    const account = await findResettableAccount({ email, transaction });
    if (!account) return;
    const since = new Date(now.getTime() - RESEND_MINUTES * 60_000);
    if ((await countResetLinksSince({ userId: account.userId, since, transaction })) > 0) return;
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + RESET_MINUTES * 60_000);
    await insertResetLink({ teamId: account.teamId, userId: account.userId, tokenHash: hash, expiresAt, transaction });
    await enqueueMail({
      transaction,
      teamId: account.teamId,
      kind: "password_reset",
      to: account.email,
      mail: passwordResetEmail({
        name: account.name,
        resetUrl: `${appUrl()}/invite/${token}`,
        expiresAt,
        timeZone: account.timeZone ?? undefined,
      }),
    });
  });
}
