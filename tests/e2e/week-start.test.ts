// The head coach picks the team's week start on the settings screen (react-hook-form + zod, PATCH week-start);
// the planner then opens on a Sunday. Real HTTP and Chromium against next start, on a club of the test's own.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_PASSWORD } from "@/lib/seed/demo-club";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const HEAD = "head@sunday-striders.test";
const COACH = "coach@sunday-striders.test";
const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");

describeBrowser("the team's week start", () => {
  let app: MailApp;
  let browser: Browser;
  let teamId: number;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    const now = sqlNow();
    await app.query(
      "INSERT INTO teams (name, time_zone, week_start_day, created_at, updated_at) VALUES ('Sunday Striders', 'Europe/London', 1, ?, ?)",
      [now, now],
    );
    const [team] = await app.query<{ id: number }>("SELECT id FROM teams WHERE name = 'Sunday Striders'");
    teamId = team.id;
    await app.query("INSERT INTO team_load_settings (team_id, created_at, updated_at) VALUES (?, ?, ?)", [
      team.id,
      now,
      now,
    ]);
    // One athlete, so the planner shows its grid (an empty team gets a hint instead).
    await app.query("INSERT INTO athletes (team_id, name, created_at, updated_at) VALUES (?, 'Wren Runner', ?, ?)", [
      team.id,
      now,
      now,
    ]);
    // The demo password's hash, so the harness can sign these invented people in.
    const [hash] = await app.query<{ password_hash: string }>("SELECT password_hash FROM users WHERE email = ?", [
      "head.coach@harbourvale.test",
    ]);
    for (const [email, name, role] of [
      [HEAD, "Sunniva Head", "head_coach"],
      [COACH, "Sol Coach", "coach"],
    ] as const) {
      await app.query("INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, ?, ?, ?, ?)", [
        email,
        name,
        hash.password_hash,
        now,
        now,
      ]);
      const [user] = await app.query<{ id: number }>("SELECT id FROM users WHERE email = ?", [email]);
      await app.query(
        "INSERT INTO memberships (user_id, team_id, role, created_at, updated_at) VALUES (?, ?, ?, ?, ?)",
        [user.id, team.id, role, now, now],
      );
    }
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("the head coach sets Sunday in the settings and the planner's week starts on Sunday", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, HEAD, DEMO_PASSWORD);
    await page.goto(`${app.url}/plan`);
    await page.getByTestId("day-heading").first().waitFor();
    expect(await page.getByTestId("day-heading").first().textContent()).toMatch(/^Mon/);

    await page.goto(`${app.url}/settings`);
    const form = page.getByTestId("week-start-form");
    // A choice made before the form has hydrated is lost (the button stays disabled): choose until the form sees it.
    const choice = form.getByLabel("Weeks start on");
    const save = form.getByRole("button", { name: "Save week start" });
    await expect
      .poll(
        async () => {
          await choice.selectOption({ label: "Monday" });
          await choice.selectOption({ label: "Sunday" });
          return save.isEnabled();
        },
        { timeout: 30_000 },
      )
      .toBe(true);
    await save.click();
    await form.getByRole("status").getByText("Saved").waitFor();
    await screenshot(page, "settings-week-start");
    const [row] = await app.query<{ week_start_day: number }>("SELECT week_start_day FROM teams WHERE id = ?", [
      teamId,
    ]);
    expect(row.week_start_day).toBe(7);

    await page.goto(`${app.url}/plan`);
    await page.getByTestId("day-heading").first().waitFor();
    const headings = await page.getByTestId("day-heading").allTextContents();
    expect(headings).toHaveLength(7);
    expect(headings[0]).toMatch(/^Sun/);
    expect(headings[6]).toMatch(/^Sat/);
    await page.close();
  }, 60_000); // two sign-ins and three page loads on a shared machine

  it("a coach gets 403 and a bad value gets a 400 naming the field", async () => {
    const coach = await apiSession(app, COACH);
    const refused = await coach.fetch(`/api/teams/${teamId}/week-start`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ weekStartDay: 1 }),
    });
    expect(refused.status).toBe(403);
    const head = await apiSession(app, HEAD);
    const bad = await head.fetch(`/api/teams/${teamId}/week-start`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ weekStartDay: 0 }),
    });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: { fields: Record<string, string[]> } }).error.fields.weekStartDay).toEqual([
      "Choose Monday or Sunday",
    ]);
  });
});
