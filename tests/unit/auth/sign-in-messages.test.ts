import { describe, expect, it } from "vitest";
import { WRONG_CREDENTIALS, signInErrorMessage, throttledCode } from "@/lib/auth/sign-in-messages";

describe("sign-in messages", () => {
  it("say when to try again, rounding up to whole minutes", () => {
    expect(signInErrorMessage(throttledCode(15 * 60_000))).toBe("Too many sign-in attempts. Try again in 15 minutes.");
    expect(signInErrorMessage(throttledCode(61_000))).toBe("Too many sign-in attempts. Try again in 2 minutes.");
    expect(signInErrorMessage(throttledCode(1))).toBe("Too many sign-in attempts. Try again in 1 minute.");
  });

  it("never show text taken from the address bar", () => {
    for (const code of [
      "Your account is locked, call +1 555 0100",
      "Throttled:15 <b>now</b>",
      "CredentialsSignin",
      "Callback",
    ]) {
      expect(signInErrorMessage(code)).toBe(WRONG_CREDENTIALS);
    }
    expect(signInErrorMessage(undefined)).toBeUndefined();
  });
});
