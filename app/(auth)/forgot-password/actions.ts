"use server";

import { runAction } from "@/lib/action-result";
import { requestPasswordReset } from "@/lib/data/password-reset";
import { forgotPasswordSchema, type ForgotPasswordInput } from "@/lib/validations/auth";

// Public by design: it only ever sends a link to the address on file, and answers the same for any address.
export async function forgotPasswordAction(input: ForgotPasswordInput) {
  return runAction(async () => {
    const { email } = forgotPasswordSchema.parse(input);
    await requestPasswordReset({ email });
    return { sent: true };
  });
}
