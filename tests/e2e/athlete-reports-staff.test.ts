// The staff's side of the athletes' reports on a phone (390 × 844): a coach reopens a log that closed 48 hours
// after its session, from the athlete's page, and the athlete can write it again; the head coach sets the pain
// line and the daily check-in switch in the team settings, and the athletes' screens and alerts follow them.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const ADA = "ada@reopenclub.test";

describeBrowser("athletes' reports, the staff's side", () => {
  let app: MailApp;
  let browser: Browser;
  let team: Awaited<ReturnType<typeof createAppTeam>>;
  const today = teamToday({ timeZone: "Europe/London", now: new Date() });
  const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");

  async function publishedSession(date: string, title: string) {
    const now = sqlNow();
    await app.query(
      "INSERT INTO planned_sessions (team_id, athlete_id, date, start_time, duration_min, title, planned_rpe, status, " +
        "notes, version, sequence, published_at, created_at, updated_at) " +
        "VALUES (?, ?, ?, '07:15', 60, ?, 6, 'published', NULL, 1, 0, ?, ?, ?)",
      [team.teamId, team.users[ADA].athleteId, date, title, now, now, now],
    );
    const [{ id }] = await app.query<{ id: number }>("SELECT id FROM planned_sessions WHERE title = ?", [title]);
    return id;
  }

  /** A published session of Ada's with her log, written straight to SQLite (the log closed if the day is old). */
  async function loggedSession(
    date: string,
    title: string,
    log: { rpe: number; minutes: number; notes: string | null },
  ) {
    const sessionId = await publishedSession(date, title);
    await app.query(
      "INSERT INTO session_logs (session_id, athlete_id, completion, rpe, minutes, completed_reps, notes, created_at, " +
        "updated_at) VALUES (?, ?, 'yes', ?, ?, NULL, ?, ?, ?)",
      [sessionId, team.users[ADA].athleteId, log.rpe, log.minutes, log.notes, sqlNow(), sqlNow()],
    );
    return sessionId;
  }

  async function phone(): Promise<{ context: BrowserContext; page: Page }> {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    return { context, page: await context.newPage() };
  }

  const noSidewaysScroll = async (page: Page) =>
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  beforeAll(async () => {
    app = await startMailApp();
    team = await createAppTeam(app.dbPath, { name: "Reopen Club" });
    browser = await launchBrowser();
  }, 900_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("a coach reopens a closed log from the athlete's page; the athlete can change it again", async () => {
    const sessionId = await loggedSession(addDays(today, -5), "Hill sprints five days ago", {
      rpe: 6,
      minutes: 50,
      notes: "Legs heavy at the end",
    });
    const athlete = await apiSession(app, ADA, TEST_PASSWORD);
    const write = () =>
      athlete.fetch(`/api/sessions/${sessionId}/log`, {
        method: "PUT",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ completion: "partly", rpe: 7, minutes: 45 }),
      });
    // More than 48 hours after the session ended: refused with the reason, and the log is unchanged.
    const refused = await write();
    expect(refused.status).toBe(409);
    expect(JSON.stringify(await refused.json())).toContain("This log is locked");

    const { context, page } = await phone();
    await signIn(page, app, "coach@reopenclub.test", TEST_PASSWORD);
    await page.goto(`${app.url}/squad/${team.users[ADA].athleteId}`);
    const row = page.locator(`[data-testid="athlete-log"][data-session-id="${sessionId}"]`);
    await row.waitFor();
    expect(await row.innerText()).toContain("Hill sprints five days ago");
    expect(await row.innerText()).toContain("Legs heavy at the end");
    expect(await row.getByTestId("athlete-log-lock").innerText()).toMatch(/^Closed to the athlete since /);
    await noSidewaysScroll(page);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-log-closed");

    await row.getByRole("button", { name: "Reopen the log of Hill sprints five days ago" }).click();
    await row
      .getByTestId("athlete-log-lock")
      .getByText(/^Open to the athlete until /)
      .waitFor();
    expect(await row.getByTestId("reopen-log").count()).toBe(0);
    // Kept in the log's history with who and when.
    const history = await app.query<{ action: string; user_id: number }>(
      "SELECT action, user_id FROM session_log_changes WHERE session_id = ? ORDER BY id",
      [sessionId],
    );
    expect(history).toEqual([{ action: "unlocked", user_id: team.users.coach.userId }]);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-log-reopened");
    await context.close();

    const saved = await write();
    expect(saved.status, await saved.clone().text()).toBe(200);
    const [log] = await app.query<{ completion: string; rpe: number; minutes: number }>(
      "SELECT completion, rpe, minutes FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect(log).toEqual({ completion: "partly", rpe: 7, minutes: 45 });
  }, 120_000);

  it("a coach reopens a closed log from the planner's session dialog, where the log is read", async () => {
    const date = addDays(today, -4);
    const title = "Wickets four days ago";
    const sessionId = await loggedSession(date, title, { rpe: 7, minutes: 55, notes: "Quick off the fourth wicket" });
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(page, app, "coach@reopenclub.test", TEST_PASSWORD);
    await page.goto(`${app.url}/plan?week=${date}`);
    const card = page.locator(
      `[data-testid="day-cell"][data-athlete-id="${team.users[ADA].athleteId}"][data-date="${date}"] ` +
        '[data-testid="session-card"]',
    );
    await card.first().locator("button").first().click();
    const dialog = page.getByTestId("session-editor");
    await dialog.waitFor();
    await dialog.getByTestId("log-note").getByText("Quick off the fourth wicket").waitFor();
    const state = dialog.getByTestId("log-lock-state");
    await state.waitFor();
    expect(await state.getAttribute("data-locked")).toBe("yes");
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "planner-log-closed");
    await dialog.getByRole("button", { name: `Reopen the log of ${title}` }).click();
    await expect.poll(() => state.getAttribute("data-locked")).toBe("no");
    expect(await state.innerText()).toMatch(/^Open to the athlete until /);
    expect(await dialog.getByTestId("reopen-log").count()).toBe(0);
    const history = await app.query<{ action: string; user_id: number }>(
      "SELECT action, user_id FROM session_log_changes WHERE session_id = ? ORDER BY id",
      [sessionId],
    );
    expect(history).toEqual([{ action: "unlocked", user_id: team.users.coach.userId }]);
    await page.close();

    // The physio reads the same dialog without the way to reopen (the route refuses a physio too, below).
    const other = await loggedSession(date, "Tempo for the physio", { rpe: 4, minutes: 30, notes: "Easy one" });
    const physio = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(physio, app, "physio@reopenclub.test", TEST_PASSWORD);
    await physio.goto(`${app.url}/plan?week=${date}`);
    await physio.locator(`[data-testid="session-card"][data-session-id="${other}"]`).locator("button").first().click();
    const read = physio.getByTestId("session-editor");
    await read.getByTestId("log-note").getByText("Easy one").waitFor();
    expect(await read.getByTestId("reopen-log").count()).toBe(0);
    expect(await read.getByTestId("log-lock").count()).toBe(0);
    await physio.close();
  }, 120_000);

  it("a physio sees a closed log but has no button to reopen it", async () => {
    const sessionId = await loggedSession(addDays(today, -6), "Tempo six days ago", {
      rpe: 5,
      minutes: 40,
      notes: null,
    });
    const { context, page } = await phone();
    await signIn(page, app, "physio@reopenclub.test", TEST_PASSWORD);
    await page.goto(`${app.url}/squad/${team.users[ADA].athleteId}`);
    const row = page.locator(`[data-testid="athlete-log"][data-session-id="${sessionId}"]`);
    await row.waitFor();
    expect(await row.getByTestId("athlete-log-lock").innerText()).toMatch(/^Closed to the athlete since /);
    expect(await page.getByTestId("reopen-log").count()).toBe(0);
    // The route refuses the physio too (the permission table gives log:unlock to coaches only).
    const physio = await apiSession(app, "physio@reopenclub.test", TEST_PASSWORD);
    expect((await physio.fetch(`/api/sessions/${sessionId}/log/unlock`, { method: "POST" })).status).toBe(403);
    await context.close();
  }, 60_000);

  it("the head coach sets the pain line and turns the daily check-in on; athletes' screens and alerts follow", async () => {
    const settings = () =>
      app.query<{ pain_alert_above: number; check_ins_enabled: number }>(
        "SELECT pain_alert_above, check_ins_enabled FROM teams WHERE id = ?",
        [team.teamId],
      );
    const { context, page } = await phone();
    await signIn(page, app, "head@reopenclub.test", TEST_PASSWORD);
    await page.goto(`${app.url}/settings`);
    const form = page.getByTestId("athlete-reports-form");
    await form.waitFor();
    const line = form.getByLabel("Alert the physio when pain is above");
    const checkIns = form.getByLabel("Ask athletes for a daily check-in");
    // The form fills its fields when it hydrates: the team's current line, then typing is kept.
    await expect.poll(() => line.inputValue()).toBe("3");
    expect(await checkIns.isChecked()).toBe(false);
    await noSidewaysScroll(page);
    expect(await seriousAxeViolations(page)).toEqual([]);

    // Out of range: the form says which field and why; nothing is saved.
    await line.fill("12");
    await form.getByTestId("save-athlete-reports").click();
    await form.getByText("0 to 9 (a report above it alerts the physio)").waitFor();
    expect(await line.getAttribute("aria-invalid")).toBe("true");
    expect(await settings()).toEqual([{ pain_alert_above: 3, check_ins_enabled: 0 }]);
    expect(await seriousAxeViolations(page)).toEqual([]);

    await line.fill("1");
    await checkIns.check();
    await form.getByTestId("save-athlete-reports").click();
    await form
      .getByRole("status")
      .getByText(/^Saved\./)
      .waitFor();
    expect(await settings()).toEqual([{ pain_alert_above: 1, check_ins_enabled: 1 }]);
    await screenshot(page, "athlete-reports-settings");
    await page.reload();
    await form.waitFor();
    await expect.poll(() => line.inputValue()).toBe("1");
    expect(await checkIns.isChecked()).toBe(true);
    await context.close();

    // The athlete is now asked for the check-in, and a pain report of 2 (above the new line of 1) alerts the physio.
    const athletePhone = await phone();
    await signIn(athletePhone.page, app, ADA, TEST_PASSWORD);
    await athletePhone.page.goto(`${app.url}/me`);
    const checkIn = athletePhone.page.getByTestId("check-in");
    await checkIn.waitFor();
    expect(await athletePhone.page.getByTestId("check-in-trend").count()).toBe(0);
    // Five taps and a save (the quick check-in the issue asks for), then the athlete's own trend shows it.
    for (const [item, score] of Object.entries({ sleep: 4, fatigue: 3, soreness: 4, stress: 5, mood: 4 }))
      await checkIn.getByTestId(`check-in-${item}-${score}`).check({ force: true });
    await checkIn.getByTestId("check-in-save").click();
    await checkIn.getByTestId("check-in-status").getByText("Checked in today. Thank you!").waitFor();
    const trend = athletePhone.page.getByTestId("check-in-trend");
    await trend.waitFor();
    expect(await trend.innerText()).toMatch(/20 of 25/);
    await noSidewaysScroll(athletePhone.page);
    expect(await seriousAxeViolations(athletePhone.page)).toEqual([]);
    await screenshot(athletePhone.page, "athlete-check-in");
    const [stored] = await app.query<{ total: number }>(
      "SELECT sleep + fatigue + soreness + stress + mood AS total FROM check_ins WHERE athlete_id = ?",
      [team.users[ADA].athleteId],
    );
    expect(stored.total).toBe(20);
    await athletePhone.context.close();
    const sessionId = await publishedSession(addDays(today, -1), "Starts yesterday");
    const athlete = await apiSession(app, ADA, TEST_PASSWORD);
    const logged = await athlete.fetch(`/api/sessions/${sessionId}/log`, {
      method: "PUT",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        completion: "yes",
        rpe: 5,
        minutes: 40,
        pain: { region: "calf", severity: 2, stoppedSession: false },
      }),
    });
    expect(logged.status, await logged.clone().text()).toBe(200);
    const alerts = await app.query<{ id: number }>("SELECT id FROM alerts WHERE kind = 'pain' AND team_id = ?", [
      team.teamId,
    ]);
    expect(alerts).toHaveLength(1);
  }, 120_000);
});
