import { z } from "zod";
import { COMMON_PASSWORDS } from "./common-passwords";

/**
 * The one password rule (OWASP ASVS 4.0 §2.1): at least 12 characters, at most 64 (and 72 bytes, where bcrypt
 * would silently cut it: we refuse instead of truncating), not only whitespace, not one of the common passwords
 * shipped with the app (also with digits or symbols added around it), not a few characters repeated, and not the
 * account's e-mail. Any printable character is allowed, spaces included; there are no composition rules (§2.1.9).
 */
const PASSWORD_MIN = 12;
const PASSWORD_MAX = 64;
const BCRYPT_MAX_BYTES = 72;

export const PASSWORD_HINT = `At least ${PASSWORD_MIN} characters. A few unrelated words make a good one.`;

function isCommon(password: string): boolean {
  const lower = password.trim().toLowerCase();
  const core = lower.replace(/^[\d\W_]+|[\d\W_]+$/g, "");
  return COMMON_PASSWORDS.has(lower) || (core.length >= 4 && COMMON_PASSWORDS.has(core));
}

/** The rule without the e-mail check: for forms and schemas that do not know the account. */
export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`)
  .refine(
    (p) => new TextEncoder().encode(p).length <= BCRYPT_MAX_BYTES,
    `This password is too long; use fewer special characters`,
  )
  .refine((p) => p.trim().length > 0, "A password cannot be only spaces")
  .refine((p) => new Set(p.toLowerCase()).size >= 4, "Use more different characters")
  .refine((p) => !isCommon(p), "This password is too common; choose a less predictable one");

/** True when the password is (or merely wraps) the account's e-mail address or its part before the @. */
export function resemblesEmail(password: string, email: string): boolean {
  const p = password.trim().toLowerCase();
  const e = email.trim().toLowerCase();
  const local = e.split("@")[0] ?? "";
  if (!e) return false;
  return p.includes(e) || p === local || (local.length >= 4 && p.replace(/^[\d\W_]+|[\d\W_]+$/g, "") === local);
}

const NOT_EMAIL_MESSAGE = "Do not use your e-mail address as your password";

/** The full rule for one account, e.g. `passwordFor(email).safeParse(password)`. */
export function passwordFor(email: string) {
  return passwordSchema.refine((p) => !resemblesEmail(p, email), NOT_EMAIL_MESSAGE);
}
