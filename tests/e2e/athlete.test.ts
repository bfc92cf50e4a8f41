// Athlete journey on a phone-sized screen: sign in, copy the calendar link, fetch it like a calendar app
// would and parse it with ical.js (an independent iCalendar parser), log a session, turn the link off.
import ICAL from "ical.js";
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, BrowserContext } from "playwright-core";
import { teamToday } from "@/lib/dates/zoned";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const MAYA = "maya@harbourvale.test";

describeBrowser("athlete journey", () => {
  let app: MailApp;
  let browser: Browser;
  let context: BrowserContext;
  let feedUrl = "";

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: app.url });
  }, 240_000);
  afterAll(async () => {
    await context?.close();
    await browser?.close();
    await app?.stop();
  });

  it("the coach publishes next week: the athlete gets a calendar invitation (METHOD:REQUEST) by e-mail", async () => {
    const coach = await apiSession(app, "coach@harbourvale.test");
    const [maya] = await app.query<{ id: number; team_id: number }>(
      "SELECT a.id, a.team_id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
      [MAYA],
    );
    const nextWeek = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
    const created = await coach.fetch(`/api/teams/${maya!.team_id}/sessions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        from: "blank",
        athleteId: maya!.id,
        date: addDays(nextWeek, 6),
        startTime: "11:00",
        durationMin: 45,
        title: "Sunday strides, relaxed",
        plannedRpe: 4,
        blocks: [],
      }),
    });
    expect(created.status, await created.clone().text()).toBeLessThan(300);
    const published = await coach.fetch(`/api/teams/${maya!.team_id}/plan/publish`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ week: nextWeek }),
    });
    expect(published.status, await published.clone().text()).toBe(200);
    const mail = await app.waitForMail(MAYA, (m) => m.subject.startsWith("Your sessions for the week of"));
    const ics = mail.attachments.find((a) => /^text\/calendar/i.test(a.contentType));
    const invite = new ICAL.Component(ICAL.parse(ics!.content));
    expect(invite.getFirstPropertyValue("method")).toBe("REQUEST");
    const summaries = invite.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v).summary);
    expect(summaries).toContain("Sunday strides, relaxed");
  });

  it("copies the calendar link, and the link serves a calendar with the athlete's sessions", async () => {
    const page = await context.newPage();
    await signIn(page, app, MAYA);
    await page.goto(`${app.url}/me`);
    await page.getByTestId("feed-card").waitFor();
    await page.getByTestId("feed-copy").click();
    await page.getByTestId("feed-message").getByText("Link copied.").waitFor();
    feedUrl = await page.evaluate(() => navigator.clipboard.readText());
    expect(feedUrl).toMatch(new RegExp(`^${app.url.replace(/[.:/]/g, "\\$&")}/api/calendar/[A-Za-z0-9_-]{43}\\.ics$`));
    expect(await page.getByTestId("feed-url").inputValue()).toBe(feedUrl);
    expect(await page.getByTestId("feed-webcal").getAttribute("href")).toBe(feedUrl.replace(/^http:/, "webcal:"));
    await screenshot(page, "athlete-me");
    await page.getByTestId("feed-card").screenshot({ path: "tests/e2e/artifacts/athlete-feed-card.png" });

    // Fetched without any cookie, as a phone's calendar does.
    const res = await fetch(feedUrl);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/calendar; charset=utf-8");
    const cal = new ICAL.Component(ICAL.parse(await res.text()));
    const events = cal.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));
    const [{ id }] = await app.query<{ id: number }>(
      "SELECT a.id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
      [MAYA],
    );
    // The feed reaches 8 weeks back (the demo's history reaches 10) and holds everything ahead.
    const from = addDays(teamToday({ timeZone: "Europe/London", now: new Date() }), -56);
    const stored = await app.query<{ id: number }>(
      "SELECT id FROM planned_sessions WHERE athlete_id = ? AND status IN ('published','cancelled') AND date >= ? " +
        "ORDER BY date, start_time, id",
      [id, from],
    );
    expect(stored.length).toBeGreaterThan(0);
    const older = await app.query<{ id: number }>(
      "SELECT id FROM planned_sessions WHERE athlete_id = ? AND status = 'published' AND date < ?",
      [id, from],
    );
    expect(older.length).toBeGreaterThan(0);
    expect(events.map((e) => e.uid)).toEqual(stored.map((s) => `session-${s.id}@sprintwright`));
    expect(events.map((e) => e.summary)).toContain("Sunday strides, relaxed");
    const others = await app.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM planned_sessions WHERE athlete_id <> ? AND status = 'published'",
      [id],
    );
    expect(others[0]!.n).toBeGreaterThan(0); // other athletes have sessions, and none of them is in Maya's feed
    await page.close();
  });

  it("logs a session from the phone", async () => {
    // Today, published, two running blocks: whatever the demo holds today, there is one to log.
    const [{ id: mayaId, team_id: teamId }] = await app.query<{ id: number; team_id: number }>(
      "SELECT a.id, a.team_id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
      [MAYA],
    );
    const now = new Date().toISOString().replace("T", " ").replace("Z", " +00:00");
    const title = `Phone log ${Date.now()}`;
    await app.query(
      "INSERT INTO planned_sessions (team_id, athlete_id, date, start_time, duration_min, title, planned_rpe, status, notes, " +
        "version, sequence, published_at, created_at, updated_at) VALUES (?, ?, ?, '18:30', 50, ?, 6, 'published', NULL, 1, 0, ?, ?, ?)",
      [teamId, mayaId, teamToday({ timeZone: "Europe/London", now: new Date() }), title, now, now, now],
    );
    const [{ id: fresh }] = await app.query<{ id: number }>("SELECT id FROM planned_sessions WHERE title = ?", [title]);
    const running = JSON.stringify({
      sets: 1,
      reps: 4,
      distanceM: 30,
      intensityPct: 95,
      start: "crouch",
      runInM: 0,
      restSec: 180,
    });
    for (const [position, name] of ["Block starts", "Rolling 20s"].entries())
      await app.query(
        "INSERT INTO session_blocks (session_id, template_id, position, kind, title, running, drills, notes, created_at, updated_at) " +
          "VALUES (?, NULL, ?, 'acceleration', ?, ?, NULL, NULL, ?, ?)",
        [fresh, position, name, running, now, now],
      );
    const page = await context.newPage();
    await page.goto(`${app.url}/me`);
    // A session still open to log: today's (the card at the top) or one in the week's list, into the log sheet.
    const hero = page.getByTestId("today-session");
    await hero.waitFor();
    const row = page.locator(`[data-testid="my-session"][data-session-id="${fresh}"]`);
    const fromHero = Number(await hero.getAttribute("data-session-id")) === fresh;
    const sessionId = fresh;
    const card = page.locator(`dialog[open][data-testid="session-sheet"]`);
    if (fromHero) await hero.getByTestId("open-log").click();
    else {
      await row.getByTestId("open-session").click();
      await card.getByTestId("start-log").click();
    }
    // The blocks appear ticked with the planned reps; untick the first, do 1 rep of the second ("part of it").
    const blocks = card.getByTestId("log-block");
    await blocks.first().waitFor();
    const expected: Record<string, number> = {};
    for (let i = 0; i < (await blocks.count()); i++) {
      const b = blocks.nth(i);
      expect(await b.getByTestId("log-block-done").isChecked()).toBe(true);
      expected[(await b.getAttribute("data-block-id"))!] = Number(await b.getByTestId("log-block-reps").inputValue());
    }
    const ids = Object.keys(expected);
    await blocks.first().getByTestId("log-block-done").uncheck();
    expected[ids[0]] = 0;
    if (ids.length > 1) {
      await blocks.nth(1).getByTestId("log-block-reps").fill("1");
      expected[ids[1]] = 1;
    }
    expect(await card.getByTestId("log-completion-partly").isChecked()).toBe(true);
    await card.getByTestId("log-rpe-6").check();
    await card.getByTestId("log-minutes").fill("0");
    await card.getByTestId("log-save").click();
    await card.getByText("At least 1 min").waitFor(); // the zod message, before anything is sent
    await card.getByTestId("log-minutes").fill("55");
    await card.getByTestId("log-notes").fill("Legs heavy after the third rep.");
    await card.getByTestId("log-save").click();
    await card.waitFor({ state: "hidden" });
    await screenshot(page, "athlete-logged");
    const [log] = await app.query<{ completion: string; rpe: number; minutes: number; notes: string }>(
      "SELECT completion, rpe, minutes, notes FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect(log).toEqual({ completion: "partly", rpe: 6, minutes: 55, notes: "Legs heavy after the third rep." });
    const [{ completed_reps: reps }] = await app.query<{ completed_reps: string }>(
      "SELECT completed_reps FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect(JSON.parse(reps)).toEqual(expected);
    await page.reload();
    if (fromHero) await hero.getByTestId("my-log-summary").waitFor();
    else {
      await page.locator(`[data-session-id="${sessionId}"]`).getByTestId("open-session").click();
      await page.locator(`dialog[open][data-testid="session-sheet"]`).getByTestId("my-log-summary").waitFor();
    }
    await page.close();
  });

  it("turns the link off: the old address answers 404", async () => {
    const page = await context.newPage();
    await page.goto(`${app.url}/me`);
    await page.getByTestId("feed-revoke").click();
    await page.getByTestId("feed-confirm").click();
    await page.getByTestId("feed-off").waitFor();
    expect((await fetch(feedUrl)).status).toBe(404);
    await page.getByTestId("feed-rotate").click();
    await page.getByTestId("feed-url").waitFor();
    const fresh = await page.getByTestId("feed-url").inputValue();
    expect(fresh).not.toBe(feedUrl);
    expect((await fetch(fresh)).status).toBe(200);
    await screenshot(page, "athlete-new-link");
    await page.close();
  });
});
