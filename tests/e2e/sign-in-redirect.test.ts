import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_PASSWORD, DEMO_STAFF } from "@/lib/seed/demo-club";
import { describeBrowser, launchBrowser, startApp, type App } from "./harness";
import { postCredentials } from "../helpers/auth-http";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;

// The two reported bypasses plus close relatives, as they stand in the address bar (encoded once).
const CRAFTED = [
  "/%5Cevil.test/phish",
  "/%09/evil.test",
  "%2F%2Fevil.test",
  "/%2E//evil.test",
  "https%3A%2F%2Fevil.test",
  "/%0A/evil.test",
];

describeBrowser("sign-in keeps the browser on the site", () => {
  let app: App;
  let browser: Browser;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it.each(CRAFTED)("lands on the workspace after signing in from callbackUrl=%s", async (crafted) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    const leftSite: string[] = [];
    page.on("request", (r) => {
      if (new URL(r.url()).origin !== app.url) leftSite.push(r.url());
    });
    await page.goto(`${app.url}/sign-in?callbackUrl=${crafted}`);
    await page.getByLabel("E-mail").fill(coach.email);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 15_000 });
    expect(new URL(page.url()).origin).toBe(app.url);
    expect(new URL(page.url()).pathname).toBe("/home");
    expect(leftSite).toEqual([]);
    await context.close();
  });

  it("still returns to a same-site page the proxy asked for", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${app.url}/plan`);
    await page.waitForURL((u) => u.pathname === "/sign-in");
    expect(new URL(page.url()).searchParams.get("callbackUrl")).toBe("/plan");
    await page.getByLabel("E-mail").fill(coach.email);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname === "/plan", { timeout: 15_000 });
    await context.close();
  });

  it("answers next-auth's own sign-in endpoint with a same-site URL only", async () => {
    for (const callbackUrl of ["/\\evil.test/phish", "/\t/evil.test", "https://evil.test/"]) {
      const res = await postCredentials(app, { email: coach.email, password: DEMO_PASSWORD, callbackUrl });
      const target = res.headers.get("location") ?? ((await res.json()) as { url: string }).url;
      // A browser resolves the answer the same way: it must stay on the site.
      expect(new URL(target, app.url).origin, callbackUrl).toBe(app.url);
      expect(new URL(target, app.url).pathname.startsWith("//"), callbackUrl).toBe(false);
    }
  });
});
