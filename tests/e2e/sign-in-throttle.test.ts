import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_PASSWORD, DEMO_STAFF } from "@/lib/seed/demo-club";
import { apiSession, describeBrowser, launchBrowser, startApp, type App } from "./harness";
import { postCredentials } from "../helpers/auth-http";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;
const physio = DEMO_STAFF.find((s) => s.role === "physio")!;

type Answer = { signedIn: boolean; error: string | null };

/**
 * One sign-in over HTTP, as a script would send it. `from` sets X-Forwarded-For, which `next start` keeps when a
 * client sends it: that is how the test stands in for clients at different addresses.
 */
async function attempt(app: App, email: string, password: string, from: string): Promise<Answer> {
  const res = await postCredentials(app, { email, password }, { "x-forwarded-for": from });
  const signedIn = res.headers
    .getSetCookie()
    .some((c) => c.includes("next-auth.session-token=") && !c.includes("Max-Age=0"));
  const { url } = (await res.json()) as { url: string };
  return { signedIn, error: new URL(url).searchParams.get("error") };
}

describeBrowser("sign-in throttling", () => {
  let app: App;
  let browser: Browser;

  beforeAll(async () => {
    app = await startApp({ env: { OUTBOX_WORKER: "0" } });
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("stops 50 fast guesses at one account, and the right password straight after is refused too", async () => {
    const answers: Answer[] = [];
    for (let round = 0; round < 5; round++) {
      answers.push(
        ...(await Promise.all(
          Array.from({ length: 10 }, (_, i) => attempt(app, coach.email, `wrong-guess-${round}-${i}`, "203.0.113.7")),
        )),
      );
    }
    expect(answers.filter((a) => a.error === "CredentialsSignin")).toHaveLength(10);
    expect(answers.filter((a) => a.error?.startsWith("Throttled:"))).toHaveLength(40);
    // From another address, with the right password: the account is still closed for now.
    const right = await attempt(app, coach.email, DEMO_PASSWORD, "198.51.100.20");
    expect(right).toEqual({ signedIn: false, error: "Throttled:15" });
  });

  it("answers an unknown account exactly like a known one", async () => {
    const known: Answer[] = [];
    const unknown: Answer[] = [];
    for (let i = 0; i < 12; i++) {
      known.push(await attempt(app, physio.email, `wrong-${i}`, "203.0.113.8"));
      unknown.push(await attempt(app, "no-such-person@harbourvale.test", `wrong-${i}`, "203.0.113.9"));
    }
    expect(unknown).toEqual(known);
    expect(known.at(-1)).toEqual({ signedIn: false, error: "Throttled:15" });
  });

  it("closes one address that guesses across many accounts", async () => {
    const spread = await Promise.all(
      Array.from({ length: 30 }, (_, i) =>
        attempt(app, `guess${i}@harbourvale.test`, "wrong-password", "203.0.113.10"),
      ),
    );
    expect(spread.every((a) => a.error === "CredentialsSignin")).toBe(true);
    expect(await attempt(app, "one-more@harbourvale.test", "wrong-password", "203.0.113.10")).toEqual({
      signedIn: false,
      error: "Throttled:15",
    });
    // Other clients are not held up.
    expect((await attempt(app, "one-more@harbourvale.test", "wrong-password", "203.0.113.11")).error).toBe(
      "CredentialsSignin",
    );
  });

  it(
    "tells the person in the browser when to try again, and other accounts still sign in",
    { timeout: 60_000 },
    async () => {
      const page = await browser.newPage();
      await page.goto(`${app.url}/sign-in`);
      await page.getByLabel("E-mail").fill(coach.email);
      await page.getByLabel("Password").fill(DEMO_PASSWORD);
      await page.getByRole("button", { name: "Sign in" }).click();
      await expect(page.getByTestId("sign-in-error").textContent()).resolves.toBe(
        "Too many sign-in attempts. Try again in 15 minutes.",
      );
      await page.close();
      const head = DEMO_STAFF.find((s) => s.role === "head_coach")!;
      await expect(apiSession(app, head.email)).resolves.toBeTruthy();
    },
  );
});
