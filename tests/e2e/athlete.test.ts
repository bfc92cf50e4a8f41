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
    const page = await context.newPage();
    await page.goto(`${app.url}/me`);
    const card = page
      .getByTestId("my-session")
      .filter({ has: page.getByTestId("log-form") })
      .first();
    await card.waitFor();
    const sessionId = Number(await card.getAttribute("data-session-id"));
    await card.getByTestId("log-completion-partly").check();
    // "Did part of it": the blocks appear ticked with the planned reps; untick the first, do 1 rep of the second.
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
    await card.getByTestId("log-rpe").fill("11");
    await card.getByTestId("log-save").click();
    await card.getByText("CR-10: 0 to 10").waitFor(); // the zod message, before anything is sent
    await card.getByTestId("log-rpe").fill("6.5");
    await card.getByTestId("log-minutes").fill("55");
    await card.getByTestId("log-notes").fill("Legs heavy after the third rep.");
    await card.getByTestId("log-save").click();
    await card.getByTestId("log-status").getByText("Saved").waitFor();
    await screenshot(page, "athlete-logged");
    await card.screenshot({ path: "tests/e2e/artifacts/athlete-log-card.png" });
    const [log] = await app.query<{ completion: string; rpe: number; minutes: number; notes: string }>(
      "SELECT completion, rpe, minutes, notes FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect(log).toEqual({ completion: "partly", rpe: 6.5, minutes: 55, notes: "Legs heavy after the third rep." });
    const [{ completed_reps: reps }] = await app.query<{ completed_reps: string }>(
      "SELECT completed_reps FROM session_logs WHERE session_id = ?",
      [sessionId],
    );
    expect(JSON.parse(reps)).toEqual(expected);
    await page.reload();
    await page.locator(`[data-session-id="${sessionId}"]`).getByTestId("my-log-summary").waitFor();
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
