// The athlete's day on a phone (390 × 844): today's session at the top in plain words, logged in a sheet with
// two of three blocks done, RPE 7 for 60 minutes and mild calf pain, then the week's load moves; "My load" shows
// only their own figures; axe finds no serious or critical violation; a session a later restriction breaks is
// marked as changed by the medical staff; a Sunday-start team's "this week" runs Sunday to Saturday.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { formatDayShort } from "@/lib/format/dates";
import { MEDICAL_CHANGE_NOTICE } from "@/lib/restrictions/conflicts";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";
import { seriousAxeViolations } from "./axe";
import { describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const ADA = "ada@phoneclub.test";

describeBrowser("athlete's day on the phone", () => {
  let app: MailApp;
  let browser: Browser;
  let context: BrowserContext;
  let team: Awaited<ReturnType<typeof createAppTeam>>;
  let sessionId = 0;
  const today = teamToday({ timeZone: "Europe/London", now: new Date() });
  const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");

  async function addSession(
    athleteId: number,
    date: string,
    title: string,
    blocks: string[],
    notes: string | null,
    kind = "acceleration",
  ) {
    const now = sqlNow();
    await app.query(
      "INSERT INTO planned_sessions (team_id, athlete_id, date, start_time, duration_min, title, planned_rpe, status, " +
        "notes, version, sequence, published_at, created_at, updated_at) " +
        "VALUES (?, ?, ?, '07:15', 60, ?, 6, 'published', ?, 1, 0, ?, ?, ?)",
      [team.teamId, athleteId, date, title, notes, now, now, now],
    );
    const [{ id }] = await app.query<{ id: number }>("SELECT id FROM planned_sessions WHERE title = ?", [title]);
    const running = JSON.stringify({
      sets: 1,
      reps: 4,
      distanceM: 40,
      intensityPct: 95,
      start: "crouch",
      runInM: 0,
      restSec: 180,
    });
    for (const [position, name] of blocks.entries())
      await app.query(
        "INSERT INTO session_blocks (session_id, template_id, position, kind, title, running, drills, notes, " +
          "created_at, updated_at) VALUES (?, NULL, ?, ?, ?, ?, NULL, NULL, ?, ?)",
        [id, position, kind, name, running, now, now],
      );
    return id;
  }

  async function noSidewaysScroll(page: Page) {
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  }

  const srpeOnCard = (page: Page) =>
    page
      .getByTestId("my-load-srpe")
      .getByTestId("my-load-value")
      .innerText()
      .then((t) => Number(t.replace(/\D+/g, "")));

  beforeAll(async () => {
    app = await startMailApp();
    team = await createAppTeam(app.dbPath, { name: "Phone Club" });
    const ada = team.users[ADA].athleteId!;
    const ben = team.users["ben@phoneclub.test"].athleteId!;
    sessionId = await addSession(
      ada,
      today,
      "Acceleration morning",
      ["Block starts", "Three-point starts", "Wicket run"],
      "Full recovery between reps.",
    );
    // Ben's session the same day: never on Ada's screens.
    await addSession(ben, today, "Ben only session", ["Flys"], null);
    await app.query(
      "INSERT INTO restrictions (team_id, athlete_id, rule, block_kinds, limit_value, starts_on, ends_on, lifted_on, note, " +
        "created_by, lifted_by, created_at, updated_at) VALUES (?, ?, 'contact_cap', NULL, 80, ?, NULL, NULL, 'Shin care', " +
        "NULL, NULL, ?, ?)",
      [team.teamId, ada, today, sqlNow(), sqlNow()],
    );
    browser = await launchBrowser();
    context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  }, 900_000);
  afterAll(async () => {
    await context?.close();
    await browser?.close();
    await app?.stop();
  });

  it("shows today's session first in plain words and logs it in a sheet; the week's load moves", async () => {
    const page = await context.newPage();
    await signIn(page, app, ADA, TEST_PASSWORD);
    await page.goto(`${app.url}/me`);
    const hero = page.getByTestId("today-session");
    await hero.waitFor();
    expect(Number(await hero.getAttribute("data-session-id"))).toBe(sessionId);
    expect(await hero.innerText()).toContain("Acceleration morning");
    expect(await hero.getByTestId("session-start").innerText()).toContain("07:15");
    expect(await hero.getByTestId("session-blocks").innerText()).toContain("Wicket run");
    expect(await hero.getByTestId("session-coach-notes").innerText()).toContain("Full recovery between reps.");
    expect(await hero.getByTestId("session-restrictions").innerText()).toContain("At most 80 ground contacts");
    expect(await page.getByText("Ben only session").count()).toBe(0);
    await noSidewaysScroll(page);
    expect(await seriousAxeViolations(page)).toEqual([]);
    expect(await srpeOnCard(page)).toBe(0);
    await screenshot(page, "athlete-day-today");

    await hero.getByTestId("open-log").click();
    const sheet = page.locator(`dialog[open][data-testid="session-sheet"]`);
    await sheet.getByTestId("log-form").waitFor();
    const blocks = sheet.getByTestId("log-block");
    expect(await blocks.count()).toBe(3);
    await blocks.nth(2).getByTestId("log-block-done").uncheck();
    expect(await sheet.getByTestId("log-completion-partly").isChecked()).toBe(true);
    // The CR-10 words beside the numbers (Foster et al. 2001, Table 1).
    expect(await sheet.getByTestId("log-rpe").innerText()).toContain("Very hard");
    await sheet.getByTestId("log-rpe-7").check();
    await sheet.getByTestId("log-minutes").fill("60");
    await sheet.getByTestId("log-pain-toggle").check();
    await sheet.getByTestId("log-pain-region").selectOption("calf");
    await sheet.getByTestId("log-pain-severity-2").check({ force: true });
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-day-sheet");
    await sheet.getByTestId("log-save").click();
    await sheet.waitFor({ state: "hidden" });

    await hero.getByTestId("my-log-summary").getByText("partly done, RPE 7, 1 h, calf pain 2/10").waitFor();
    // sRPE = RPE × minutes (Foster et al. 2001): 7 × 60 = 420 AU.
    await expect.poll(() => srpeOnCard(page)).toBe(420);
    const [log] = await app.query<{ completion: string; rpe: number; minutes: number; completed_reps: string }>(
      "SELECT completion, rpe, minutes, completed_reps FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect({ ...log, completed_reps: Object.values(JSON.parse(log.completed_reps)) }).toEqual({
      completion: "partly",
      rpe: 7,
      minutes: 60,
      completed_reps: [4, 4, 0],
    });
    const pain = await app.query<{ region: string; severity: number; stopped_session: number }>(
      "SELECT region, severity, stopped_session FROM pain_reports WHERE session_id = ?",
      [sessionId],
    );
    expect(pain).toEqual([{ region: "calf", severity: 2, stopped_session: 0 }]);
    // Mild (2, the team's line is above 3): no physio alert.
    expect(await app.query("SELECT id FROM alerts WHERE kind = 'pain' AND team_id = ?", [team.teamId])).toEqual([]);
    await screenshot(page, "athlete-day-logged");
    await page.close();
  }, 120_000);

  it("shows my load on the phone: only my own weekly figures, with no serious axe finding", async () => {
    const page = await context.newPage();
    await page.goto(`${app.url}/me/load`);
    await page.getByTestId("my-load-hsrM").waitFor();
    // Two of three blocks: 2 × 4 × 40 m of the 3 × 4 × 40 m planned were run; the HSR counted is under the full plan.
    const hsr = Number(
      (await page.getByTestId("my-load-hsrM").getByTestId("my-load-value").innerText()).replace(/\D+/g, ""),
    );
    expect(hsr).toBeGreaterThan(0);
    expect(hsr).toBeLessThan(3 * 4 * 40);
    expect(await srpeOnCard(page)).toBe(420);
    expect(await page.getByTestId("my-speed").innerText()).toContain("9.5 m/s");
    expect(await page.getByText("Ben", { exact: false }).count()).toBe(0);
    await noSidewaysScroll(page);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-day-my-load");
    await page.close();
  }, 60_000);

  it("marks a session that a restriction set after it was sent now breaks, and only that one", async () => {
    const ada = team.users[ADA].athleteId!;
    const flys = await addSession(ada, addDays(today, 2), "Top speed flys", ["Flying 30s"], null, "max_velocity");
    const starts = await addSession(ada, addDays(today, 3), "Short starts", ["Two-point starts"], null);
    // The physio's limit comes after both sessions were published (as when it is set on the squad status screen).
    await app.query(
      "INSERT INTO restrictions (team_id, athlete_id, rule, block_kinds, limit_value, starts_on, ends_on, lifted_on, note, " +
        "created_by, lifted_by, created_at, updated_at) VALUES (?, ?, 'no_kind', ?, NULL, ?, NULL, NULL, 'Hamstring care', " +
        "NULL, NULL, ?, ?)",
      [team.teamId, ada, JSON.stringify(["max_velocity"]), today, sqlNow(), sqlNow()],
    );
    const page = await context.newPage();
    await page.goto(`${app.url}/me`);
    const row = (id: number) => page.locator(`[data-testid="my-session"][data-session-id="${id}"]`);
    await row(flys).waitFor();
    expect(await row(flys).innerText()).toContain("Medical change");
    expect(await row(starts).innerText()).not.toContain("Medical change");
    // Today's session (acceleration only) breaks nothing: no mark at the top.
    expect(await page.getByTestId("today-session").getByTestId("session-medical-change").count()).toBe(0);
    await noSidewaysScroll(page);
    expect(await seriousAxeViolations(page)).toEqual([]);

    await row(flys).getByTestId("open-session").click();
    const sheet = page.locator(`dialog[open][data-testid="session-sheet"]`);
    const mark = sheet.getByTestId("session-medical-change");
    await mark.waitFor();
    const words = await mark.innerText();
    expect(words).toContain(MEDICAL_CHANGE_NOTICE);
    expect(words).toMatch(/No max velocity/);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-day-medical-change");
    await page.keyboard.press("Escape");
    await sheet.waitFor({ state: "hidden" });

    await row(starts).getByTestId("open-session").click();
    await sheet.waitFor();
    expect(await sheet.getByTestId("session-medical-change").count()).toBe(0);
    await app.query("DELETE FROM restrictions WHERE note = 'Hamstring care'");
    await page.close();
  }, 60_000);

  it("runs 'this week' Sunday to Saturday for a Sunday-start team", async () => {
    await app.query("UPDATE teams SET week_start_day = 7 WHERE id = ?", [team.teamId]);
    const sunday = startOfWeek(today, 7);
    const ada = team.users[ADA].athleteId!;
    // The days that differ from a Monday week: the Saturday before, this week's Sunday and the next Sunday.
    const saturdayBefore = await addSession(ada, addDays(sunday, -1), "Saturday before the week", [], null);
    const firstDay = await addSession(ada, sunday, "Sunday that opens the week", [], null);
    const nextSunday = await addSession(ada, addDays(sunday, 7), "Sunday that opens next week", [], null);
    const page = await context.newPage();
    await page.goto(`${app.url}/me`);
    const thisWeek = page.getByTestId("week-this");
    const nextWeek = page.getByTestId("week-next");
    await thisWeek.waitFor();
    expect(await thisWeek.textContent()).toContain(`from ${formatDayShort(sunday)}`);
    expect(await nextWeek.textContent()).toContain(`from ${formatDayShort(addDays(sunday, 7))}`);
    const ids = async (list: typeof thisWeek) =>
      await list.getByTestId("my-session").evaluateAll((els) => els.map((e) => Number(e.dataset.sessionId)));
    const hero = Number(await page.getByTestId("today-session").getAttribute("data-session-id"));
    // Today's hero is shown above the lists; when the Sunday is today it is the hero instead of a row.
    expect(firstDay === hero || (await ids(thisWeek)).includes(firstDay)).toBe(true);
    expect(await ids(thisWeek)).not.toContain(nextSunday);
    expect(await ids(nextWeek)).toContain(nextSunday);
    expect([...(await ids(thisWeek)), ...(await ids(nextWeek))]).not.toContain(saturdayBefore);
    expect(await page.getByText("Saturday before the week").count()).toBe(0);
    await noSidewaysScroll(page);
    await app.query("UPDATE teams SET week_start_day = 1 WHERE id = ?", [team.teamId]);
    await page.close();
  }, 60_000);
});
