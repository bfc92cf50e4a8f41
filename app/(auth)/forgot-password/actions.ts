"use server";

import { after } from "next/server";
import { runAction } from "@/lib/action-result";
import { requestPasswordReset } from "@/lib/services/password-reset";
import { forgotPasswordSchema, type ForgotPasswordInput } from "@/lib/validations/auth";

// Public by design: it only ever sends a link to the address on file, and answers the same for any address.
export async function forgotPasswordAction(input: ForgotPasswordInput) {
  return runAction(async () => {
    const { email } = forgotPasswordSchema.parse(input);
    // The account lookup, the link and the mail run after the answer is sent, so a known address and an unknown
    // one answer in the same time (the work differs, the answer does not wait for it).
    after(() =>
      requestPasswordReset({ email }).catch((err: unknown) => console.error("password reset request failed", err)),
    );
    return { sent: true };
  });
}
