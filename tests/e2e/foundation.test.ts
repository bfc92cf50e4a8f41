import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";

const headCoach = DEMO_STAFF.find((s) => s.role === "head_coach")!;
const physio = DEMO_STAFF.find((s) => s.role === "physio")!;
const athlete = DEMO_ATHLETES.find((a) => a.email)!;

describeBrowser("foundation journeys", () => {
  let app: MailApp;
  let browser: Browser;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("serves the landing page with no console errors", async () => {
    const page = await browser.newPage();
    const errors: string[] = [];
    page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
    await page.goto(app.url, { waitUntil: "networkidle" });
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(/planned one week at a time/);
    expect(await page.evaluate(() => document.fonts.check("16px Inter"))).toBe(true);
    await screenshot(page, "landing");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("signs the head coach in and shows the squad", async () => {
    // A team of its own (head coach, coach, physio, two athletes), so the counts are this test's rows.
    const own = await createAppTeam(app.dbPath, { name: "Foundation Track" });
    const athletes = Object.values(own.users).filter((u) => u.athleteId !== null);
    const page = await browser.newPage();
    await signIn(page, app, "head@foundationtrack.test", TEST_PASSWORD);
    await page.goto(`${app.url}/squad`);
    const rows = page.getByTestId("squad-row");
    await rows.first().waitFor();
    expect(await rows.count()).toBe(athletes.length);
    expect(await page.getByTestId("viewer-role").textContent()).toBe("Head coach");
    await screenshot(page, "squad");
    await page.goto(`${app.url}/members`);
    expect(await page.getByTestId("member-row").count()).toBe(Object.keys(own.users).length);
    await page.close();
  });

  it("refuses an athlete a squad screen and hides squad navigation", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, athlete.email!);
    const nav = await page.getByRole("navigation", { name: "Main" }).textContent();
    expect(nav).not.toMatch(/Squad|Members|Week plan/);
    await page.goto(`${app.url}/squad`);
    await page.getByTestId("not-allowed").waitFor();
    await page.goto(`${app.url}/members`);
    await page.getByTestId("not-allowed").waitFor();
    await screenshot(page, "athlete-refused");
    await page.close();
  });

  it("shows a clear message on a wrong password", async () => {
    const page = await browser.newPage();
    await page.goto(`${app.url}/sign-in`);
    await page.getByLabel("E-mail").fill(headCoach.email);
    await page.getByLabel("Password").fill("definitely-wrong");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("sign-in-error").textContent()).resolves.toMatch(/not right/);
    // Bad input is caught field by field before it reaches the server.
    await page.getByLabel("E-mail").fill("not-an-email");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("Enter a valid e-mail address").waitFor();
    // The way out of a forgotten password answers the same for any address.
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    // Pages render per request (their CSP nonce), so wait for the new page before typing into its field.
    await page.getByRole("button", { name: "Send reset link" }).waitFor();
    await page.getByLabel("E-mail").fill("someone@nowhere.test");
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByTestId("reset-sent").waitFor();
    await page.close();
  });

  it("lets the head coach invite a member, who joins by setting a password from the e-mailed link", async () => {
    const page = await browser.newPage();
    await signIn(page, app, headCoach.email);
    await page.goto(`${app.url}/members`);
    const form = page.getByTestId("add-member-form");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await form.getByText("Enter the member's name").waitFor();
    await form.getByLabel("Name").fill("Lior Fennimore");
    await form.getByLabel("E-mail").fill(headCoach.email);
    await form.getByRole("button", { name: "Send invitation" }).click();
    await form.getByText("Already a member of this team").waitFor();
    await form.getByLabel("E-mail").fill("lior@harbourvale.test");
    await form.getByLabel("Role").selectOption("physio");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByTestId("add-member-message").getByText("Invitation sent to lior@harbourvale.test").waitFor();
    // The one-time link goes out by e-mail through the outbox, and only there (the inviter never sees it).
    expect(await page.content()).not.toContain("/invite/");
    const mail = await app.waitForMail("lior@harbourvale.test", (m) => /\/invite\//.test(m.text));
    expect(mail.subject).toMatch(/Harbour Vale/);
    const link = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/.exec(mail.text)![0];
    await page.getByTestId("invitation-row").filter({ hasText: "lior@harbourvale.test" }).waitFor();
    expect(await page.getByTestId("member-row").filter({ hasText: "lior@harbourvale.test" }).count()).toBe(0);
    await screenshot(page, "members");

    const guest = await browser.newContext();
    const invitee = await guest.newPage();
    await invitee.goto(link);
    await invitee.getByLabel("New password").fill("lior-new-password");
    await invitee.getByLabel("Repeat it").fill("lior-new-password");
    await invitee.getByRole("button", { name: "Set password" }).click();
    await invitee.waitForURL(/\/sign-in/);
    await signIn(invitee, app, "lior@harbourvale.test", "lior-new-password");
    expect(await invitee.getByTestId("viewer-role").textContent()).toBe("Physio");
    await guest.close();
    await page.close();
  });

  it("answers the session endpoint without password hashes", async () => {
    const s = await apiSession(app, physio.email);
    const res = await s.fetch("/api/auth/session");
    const body = await res.text();
    expect(res.status).toBe(200);
    expect(body).toContain(physio.email);
    expect(body).not.toMatch(/password|\$2[aby]\$/i);
  });
});
