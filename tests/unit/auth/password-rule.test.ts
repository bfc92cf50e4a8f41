import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/lib/seed/demo-club";
import { COMMON_PASSWORDS } from "@/lib/validations/common-passwords";
import { passwordFor, passwordSchema, resemblesEmail } from "@/lib/validations/password";
import { TEST_PASSWORD } from "../../helpers/fixtures";

const email = "rosa.coach@harbourvale.test";
const ok = (p: string) => passwordFor(email).safeParse(p).success;

// OWASP ASVS 4.0.3 §2.1: 2.1.1 at least 12 characters, 2.1.2 at least 64 allowed and more than 128 refused,
// 2.1.3 no truncation, 2.1.4 any printable Unicode including spaces, 2.1.7 refuse breached/common passwords,
// 2.1.9 no composition rules.
describe("password rule", () => {
  it.each([
    ["ten spaces", " ".repeat(10)],
    ["twelve spaces", " ".repeat(12)],
    ["tabs and newlines only", "\t\n \t\n \t\n \t\n"],
    ["eleven characters", "abcdefghijk"],
    ["a common password of 12+ characters", "qwertyuiop12"],
    ["a common password in capitals", "PASSWORD1234"],
    ["a common word with digits added", "sunshine2026!"],
    ["a common word with digits in front", "2026sunshine"],
    ["one character repeated", "aaaaaaaaaaaaaaaa"],
    ["three characters repeated", "abcabcabcabcabc"],
    ["the e-mail itself", email],
    ["the e-mail in capitals with spaces", `  ${email.toUpperCase()} `],
    ["the e-mail with a suffix", `${email}!!`],
    ["the part before the @ with digits", "rosa.coach2026"],
    ["65 characters", "correct horse battery staple ".repeat(3).slice(0, 65)],
    ["more than bcrypt's 72 bytes", "ü".repeat(40)],
  ])("refuses %s", (_what, password) => {
    expect(ok(password)).toBe(false);
  });

  it.each([
    ["a passphrase with spaces", "correct horse battery staple"],
    ["exactly 12 characters", "tide-map-owl"],
    ["64 characters", "harbour lanes at dusk, ".repeat(3).slice(0, 64)],
    ["Unicode letters", "Läufer über Hürden"],
    ["the demo password", DEMO_PASSWORD],
    ["the tests' password", TEST_PASSWORD],
  ])("accepts %s", (_what, password) => {
    expect(ok(password)).toBe(true);
  });

  it("names the problem", () => {
    const issues = (p: string) =>
      passwordFor(email)
        .safeParse(p)
        .error?.issues.map((i) => i.message) ?? [];
    expect(issues(" ".repeat(10))).toContain("Use at least 12 characters");
    expect(issues(" ".repeat(12))).toContain("A password cannot be only spaces");
    expect(issues("password1234")).toContain("This password is too common; choose a less predictable one");
    expect(issues(email)).toContain("Do not use your e-mail address as your password");
  });

  it("ships a list of common passwords with the app", () => {
    expect(COMMON_PASSWORDS.size).toBeGreaterThan(1000);
    // The top of every published ranking (from memory): these must be in it.
    for (const p of ["123456", "password", "qwerty", "iloveyou", "1qaz2wsx3edc"])
      expect(COMMON_PASSWORDS.has(p), p).toBe(true);
    expect(passwordSchema.safeParse("1qaz2wsx3edc").success).toBe(false);
  });

  it("compares e-mails without regard to case", () => {
    expect(resemblesEmail("Rosa.Coach@HarbourVale.test", email)).toBe(true);
    expect(resemblesEmail("harbour vale sprint", email)).toBe(false);
  });
});
