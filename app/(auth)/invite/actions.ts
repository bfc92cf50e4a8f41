"use server";

import { z } from "zod";
import { runAction } from "@/lib/action-result";
import { sessionUserId } from "@/lib/auth/access";
import { AppError } from "@/lib/errors";
import { acceptInvitation, joinTeam } from "@/lib/services/invitations";
import { setPasswordSchema, type SetPasswordInput } from "@/lib/validations/auth";

// Public by design: the one-time token is the credential, checked and spent inside acceptInvitation.
export async function setPasswordAction(input: SetPasswordInput) {
  return runAction(async () => {
    const { token, password } = setPasswordSchema.parse(input);
    return acceptInvitation({ token, password });
  });
}

const tokenSchema = z.object({
  token: z.string().min(20, "This link is not valid").max(200, "This link is not valid"),
});

/** An existing account accepts an invitation: the token and the signed-in owner of the invited account, both. */
export async function joinTeamAction(input: { token: string }) {
  return runAction(async () => {
    const { token } = tokenSchema.parse(input);
    const userId = await sessionUserId();
    if (!userId) throw new AppError("unauthenticated", "Sign in first");
    return joinTeam({ token, userId });
  });
}
