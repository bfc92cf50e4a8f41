"use server";

import { runAction } from "@/lib/action-result";
import { acceptInvitation } from "@/lib/data/members";
import { setPasswordSchema, type SetPasswordInput } from "@/lib/validations/auth";

// Public by design: the one-time token is the credential, checked and spent inside acceptInvitation.
export async function setPasswordAction(input: SetPasswordInput) {
  return runAction(async () => {
    const { token, password } = setPasswordSchema.parse(input);
    return acceptInvitation({ token, password });
  });
}
