/** Error codes the sign-in flow passes back (next-auth puts them in `?error=`), turned into words for the form. */
export const WRONG_CREDENTIALS = "E-mail or password is not right. Check both and try again.";

export const BUSY_CODE = "Busy";

export function throttledCode(retryAfterMs: number): string {
  return `Throttled:${Math.max(1, Math.ceil(retryAfterMs / 60_000))}`;
}

/** Only codes we issue are shown; anything else in the address bar gets the generic line, never its own text. */
export function signInErrorMessage(code: string | null | undefined): string | undefined {
  if (!code) return undefined;
  const throttled = /^Throttled:(\d{1,4})$/.exec(code);
  if (throttled) {
    const minutes = Number(throttled[1]);
    return `Too many sign-in attempts. Try again in ${minutes} ${minutes === 1 ? "minute" : "minutes"}.`;
  }
  if (code === "SessionEnded") return "Your session has ended. Sign in again.";
  if (code === BUSY_CODE) return "The server is busy. Try again in a moment.";
  return WRONG_CREDENTIALS;
}
