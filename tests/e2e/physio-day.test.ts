// The physio's day against next start with mail on, on a team of the test's own: an athlete reports calf pain
// above the team's line; the physio lands on their day (the pain alert first), opens the athlete, sets modified
// training; the coach's planner warns on that athlete's row, the coaches get the "plan to change" mail and the
// athlete the "changed by your medical staff" one. 390 × 844, no sideways scroll, axe-clean.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { MEDICAL_CHANGE_NOTICE } from "@/lib/restrictions/conflicts";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const ADA = "ada@painclub.test";
const PHYSIO = "physio@painclub.test";
const COACH = "coach@painclub.test";

describeBrowser("the physio's day", () => {
  let app: MailApp;
  let browser: Browser;
  let team: Awaited<ReturnType<typeof createAppTeam>>;
  let ada = 0;
  let hills = 0;
  const today = teamToday({ timeZone: "Europe/London", now: new Date() });
  const tomorrow = addDays(today, 1);
  const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");

  async function addSession(date: string, title: string, kind: string, intensityPct: number) {
    const now = sqlNow();
    await app.query(
      "INSERT INTO planned_sessions (team_id, athlete_id, date, start_time, duration_min, title, planned_rpe, status, " +
        "notes, version, sequence, published_at, created_at, updated_at) " +
        "VALUES (?, ?, ?, '07:15', 60, ?, 6, 'published', NULL, 1, 0, ?, ?, ?)",
      [team.teamId, ada, date, title, now, now, now],
    );
    const [{ id }] = await app.query<{ id: number }>("SELECT id FROM planned_sessions WHERE title = ?", [title]);
    const running = { sets: 1, reps: 4, distanceM: 30, intensityPct, start: "flying", runInM: 20, restSec: 240 };
    await app.query(
      "INSERT INTO session_blocks (session_id, template_id, position, kind, title, running, drills, notes, " +
        "created_at, updated_at) VALUES (?, NULL, 0, ?, ?, ?, NULL, NULL, ?, ?)",
      [id, kind, title, JSON.stringify(running), now, now],
    );
    return id;
  }

  const noSidewaysScroll = (page: Page) =>
    page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

  beforeAll(async () => {
    app = await startMailApp();
    team = await createAppTeam(app.dbPath, { name: "Pain Club" });
    ada = team.users[ADA].athleteId!;
    hills = await addSession(today, "Hill runs", "acceleration", 85);
    await addSession(tomorrow, "Flying 30s", "max_velocity", 95);
    browser = await launchBrowser();
    // Ada logs this morning's session with calf pain 6/10, above the team's line (3).
    const athlete = await apiSession(app, ADA, TEST_PASSWORD);
    const res = await athlete.fetch(`/api/sessions/${hills}/log`, {
      method: "PUT",
      headers: { "content-type": "application/json", origin: app.url },
      body: JSON.stringify({
        completion: "partly",
        rpe: 6,
        minutes: 40,
        completedReps: null,
        notes: "Calf went tight halfway",
        pain: { region: "calf", severity: 6, stoppedSession: true },
      }),
    });
    expect(res.status).toBe(200);
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("lands on the day with the pain alert first, opens the athlete and sets modified training", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, PHYSIO, TEST_PASSWORD);
    expect(new URL(page.url()).pathname).toBe("/home");
    const day = page.getByTestId("physio-today");
    await day.waitFor();
    const first = page.getByTestId("today-alert").first();
    expect(await first.innerText()).toContain("Pain reported");
    expect(await first.innerText()).toContain("Ada Athlete");
    expect(await page.getByTestId("today-pain").first().innerText()).toMatch(/Calf 6\/10[\s\S]*stopped the session/);
    expect(await page.getByTestId("today-notes").innerText()).toContain("Calf went tight halfway");
    expect(await page.getByTestId("today-away").count()).toBe(0);
    expect(await noSidewaysScroll(page)).toBe(true);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "physio-day-pain");
    const mail = await app.waitForMail(PHYSIO, (m) => m.subject.startsWith("Pain reported: Ada Athlete"));
    expect(mail.subject).toBe("Pain reported: Ada Athlete · Calf 6/10");

    await first.click();
    await page.waitForURL(new RegExp(`/status/${ada}$`));
    await page.getByTestId("alert-card").filter({ hasText: "Pain reported" }).waitFor();
    const form = page.getByTestId("availability-form");
    await form.getByTestId("availability-level-input").selectOption("modified");
    await form
      .getByTestId("availability-note")
      .fill(
        "Calf: tempo and strength only until it settles, then strides at 85% of vmax from next week if it stays quiet.",
      );
    await form.getByTestId("availability-save").click();
    const message = form.getByTestId("availability-message");
    await message.getByText("Saved: Modified training").waitFor();
    expect(await message.textContent()).toContain("1 session already planned breaks it: the coaches were told");

    await page.goto(`${app.url}/home`);
    await page.getByTestId("today-away").first().waitFor();
    expect(await page.getByTestId("today-away").first().innerText()).toMatch(/Ada Athlete[\s\S]*Modified training/);
    expect(await page.getByTestId("today-conflict").first().innerText()).toContain("Flying 30s");
    expect(await noSidewaysScroll(page)).toBe(true);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "physio-day-after");
    await page.close();
  }, 120_000);

  it("the coach's planner warns on her row; the coaches and the athlete are told by mail", async () => {
    const coach = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(coach, app, COACH, TEST_PASSWORD);
    await coach.goto(`${app.url}/plan?week=${startOfWeek(tomorrow, 1)}`);
    const row = coach.locator("tr").filter({ hasText: "Ada Athlete" }).first();
    await row.getByTestId("row-restriction").waitFor();
    expect(await row.getByTestId("row-restriction").textContent()).toMatch(/Running at most 85% of vmax/);
    await screenshot(coach, "physio-day-planner");
    await coach.close();

    const toCoach = await app.waitForMail(COACH, (m) => m.subject.startsWith("Plan to change: Ada Athlete"));
    expect(toCoach.text).toContain("Flying 30s");
    const toAda = await app.waitForMail(ADA, (m) => m.subject.startsWith("Changed by your medical staff"));
    expect(toAda.text).toContain(MEDICAL_CHANGE_NOTICE);
    expect(toAda.text).toContain("Flying 30s");
  }, 90_000);
});
