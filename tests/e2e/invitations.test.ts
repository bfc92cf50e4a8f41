// Another club's head coach adds an existing account: only an invitation goes out, the club sees just the
// address it typed until the owner signs in and accepts, and only then the member's name (issue 10, defect 8).
// Real HTTP and Chromium against next start; mail through the outbox to the fake SMTP server.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_PASSWORD } from "@/lib/seed/demo-club";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const PHYSIO = "physio@harbourvale.test";
const PHYSIO_NAME = "Imogen Dervaux";
const RIVAL = "head@riverside-relay.test";
const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");

describeBrowser("inviting an account of another club", () => {
  let app: MailApp;
  let browser: Browser;
  let link: string;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    // A second club with its own head coach (same demo password).
    const now = sqlNow();
    await app.query(
      "INSERT INTO teams (name, time_zone, week_start_day, created_at, updated_at) VALUES ('Riverside Relay', 'Europe/London', 1, ?, ?)",
      [now, now],
    );
    const [team] = await app.query<{ id: number }>("SELECT id FROM teams WHERE name = 'Riverside Relay'");
    await app.query("INSERT INTO team_load_settings (team_id, created_at, updated_at) VALUES (?, ?, ?)", [
      team.id,
      now,
      now,
    ]);
    const [hash] = await app.query<{ password_hash: string }>("SELECT password_hash FROM users WHERE email = ?", [
      "head.coach@harbourvale.test",
    ]);
    await app.query(
      "INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, 'Rafe Rival', ?, ?, ?)",
      [RIVAL, hash.password_hash, now, now],
    );
    const [rival] = await app.query<{ id: number }>("SELECT id FROM users WHERE email = ?", [RIVAL]);
    await app.query(
      "INSERT INTO memberships (user_id, team_id, role, created_at, updated_at) VALUES (?, ?, 'head_coach', ?, ?)",
      [rival.id, team.id, now, now],
    );
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("the rival head coach's invitation shows only the typed address, never the account's name", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, RIVAL);
    await page.goto(`${app.url}/members`);
    const form = page.getByTestId("add-member-form");
    await form.getByLabel("Name").fill("Some Physio");
    await form.getByLabel("E-mail").fill(PHYSIO);
    await form.getByLabel("Role").selectOption("physio");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByTestId("add-member-message").getByText(`Invitation sent to ${PHYSIO}`).waitFor();
    await page.getByTestId("invitation-row").filter({ hasText: PHYSIO }).waitFor();
    expect(await page.content()).not.toContain(PHYSIO_NAME);
    expect(await page.getByTestId("member-row").filter({ hasText: PHYSIO }).count()).toBe(0);
    await screenshot(page, "members-invited");
    await page.close();

    const mail = await app.waitForMail(PHYSIO, (m) => m.subject.includes("Riverside Relay"));
    expect(mail.text).toContain("sign in");
    link = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/.exec(mail.text)![0];
  });

  it("until accepted, the invited account sees nothing of the club and the club's head coach cannot accept for it", async () => {
    const rival = await apiSession(app, RIVAL);
    const page = await rival.fetch(new URL(link).pathname);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('data-testid="invite-wrong-account"');
    expect(html).not.toContain("Joining…");
    const physio = await apiSession(app, PHYSIO);
    const me = (await (await physio.fetch("/api/auth/session")).json()) as {
      user: { memberships: Array<{ teamName: string }> };
    };
    expect(me.user.memberships.map((m) => m.teamName)).toEqual(["Harbour Vale Sprint Club"]);
  });

  it("the owner signs in from the link and accepts; then the club sees the member's name", async () => {
    const context = await browser.newContext();
    const invitee = await context.newPage();
    await invitee.goto(link);
    await invitee.getByTestId("invite-sign-in").click();
    await invitee.waitForURL(/\/sign-in/);
    await invitee.getByLabel("E-mail").fill(PHYSIO);
    await invitee.getByLabel("Password").fill(DEMO_PASSWORD);
    await invitee.getByRole("button", { name: "Sign in" }).click();
    await invitee.waitForURL((u) => u.pathname.startsWith("/invite/"), { timeout: 15_000 });
    await invitee.getByRole("button", { name: "Join Riverside Relay" }).click();
    await invitee.getByTestId("join-done").waitFor();
    await screenshot(invitee, "invite-joined");
    await context.close();

    const page = await browser.newPage();
    await signIn(page, app, RIVAL);
    await page.goto(`${app.url}/members`);
    await page.getByTestId("member-row").filter({ hasText: PHYSIO_NAME }).waitFor();
    expect(await page.getByTestId("invitation-row").count()).toBe(0);
    await page.close();
  });
});
