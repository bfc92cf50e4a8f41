// The coach's day in a real browser against the built app and the demo club: Today's lists (each a link to where
// it is handled) and plan versus actual, on a desktop and at 390 px with no sideways scroll, axe-clean, with the
// figures equal to the squad week's and the plan-versus-actual handler's; an athlete's log note reaching the coach's
// Today and the physio's squad status; one athlete's plan versus actual on the coach's athlete page.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { formatNumber } from "@/lib/format/number";
import { DEMO_STAFF } from "@/lib/seed/demo-club";
import { openDatabase } from "@/models";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;
const PHYSIO = DEMO_STAFF.find((s) => s.role === "physio")!.email;
const MAYA = "maya@harbourvale.test";
const NOTE = "Right hamstring felt tight on the last fly, eased off.";

type SquadWeek = {
  today: string;
  weekStartDay: number;
  settings: { spikeRatio: number };
  rows: { id: number; name: string; dailyRatio: (number | null)[] }[];
};
type PlanActual = {
  weekStart: string;
  weeks: string[];
  athletes: {
    id: number;
    name: string;
    weeks: { done: Record<string, number>; prescribed: Record<string, number> }[];
  }[];
  squad: { done: Record<string, number>; prescribedToDate: Record<string, number> }[];
};

async function noSidewaysScroll(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
}

describeBrowser("the coach's day", () => {
  let app: App;
  let browser: Browser;
  let page: Page;
  let api: Awaited<ReturnType<typeof apiSession>>;
  let teamId: number;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, coach.email);
    api = await apiSession(app, coach.email);
    await page.goto(`${app.url}/plan`);
    teamId = Number(await page.getByTestId("planner").getAttribute("data-team-id"));
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("Today lists the day's sessions, logs, alerts, spikes ahead, restrictions and re-tests, each a link", async () => {
    await page.goto(`${app.url}/home`);
    await page.getByTestId("coach-today").waitFor();
    for (const id of ["sessions", "unlogged", "alerts", "spikes", "restrictions", "retests", "notes"])
      expect(await page.getByTestId(`today-${id}`).count()).toBe(1);
    // Flags appear here (alerts, spikes), so the caution does too.
    expect(await page.getByTestId("load-caution").count()).toBe(1);
    // Every item is a link to the screen that handles it.
    const hrefs = await page
      .locator('[data-testid="coach-today"] li a')
      .evaluateAll((els) => els.map((e) => e.getAttribute("href") ?? ""));
    expect(hrefs.length).toBeGreaterThan(0);
    for (const h of hrefs)
      expect(h).toMatch(/^\/(plan\?week=\d{4}-\d{2}-\d{2}|alerts|load\/\d+|squad(\/\d+)?|status\/\d+#session-\d+)$/);
    await screenshot(page, "coach-today");
    expect(await seriousAxeViolations(page)).toEqual([]);
  }, 60_000);

  it("the spikes ahead are the squad week's own projected ratios at or above the spike line", async () => {
    const shown = await page.getByTestId("today-spike").evaluateAll((els) => els.map((e) => e.textContent ?? ""));
    const weekRes = await api.fetch(`/api/teams/${teamId}/load?view=projected`);
    const thisWeek = (await weekRes.json()) as SquadWeek;
    const next = (await (
      await api.fetch(
        `/api/teams/${teamId}/load?view=projected&week=${addDays(startOfWeek(thisWeek.today, thisWeek.weekStartDay), 7)}`,
      )
    ).json()) as SquadWeek;
    const ws = startOfWeek(thisWeek.today, thisWeek.weekStartDay);
    const offset = (Date.parse(thisWeek.today) - Date.parse(ws)) / 86_400_000;
    const expected = thisWeek.rows
      .filter((r) => {
        const nextRow = next.rows.find((n) => n.id === r.id)!;
        const window = [...r.dailyRatio, ...nextRow.dailyRatio].slice(offset, offset + 7);
        return window.some((x) => x !== null && x - thisWeek.settings.spikeRatio >= -1e-9);
      })
      .map((r) => r.name)
      .sort();
    const names = expected.filter((n) => shown.some((t) => t.includes(n)));
    expect(names).toEqual(expected);
    expect(shown).toHaveLength(expected.length);
  });

  it("plan versus actual shows the handler's figures: a row per athlete, the squad's line and the chart", async () => {
    const dto = (await (await api.fetch(`/api/teams/${teamId}/plan-vs-actual`)).json()) as PlanActual;
    await page.goto(`${app.url}/plan-vs-actual`);
    await page.getByTestId("plan-actual-table").waitFor();
    await page.getByTestId("plan-actual-chart").locator("svg").first().waitFor();
    const rows = await page
      .getByTestId("plan-actual-row")
      .evaluateAll((els) => els.map((e) => e.getAttribute("data-athlete")));
    expect(rows).toEqual(dto.athletes.map((a) => a.name));
    // The squad's line, HSR metres (the default metric): done as the handler computed it.
    const squadText = await page.getByTestId("plan-actual-squad").textContent();
    const done = Math.round(dto.squad[dto.squad.length - 1].done.hsrM).toLocaleString("en-GB");
    expect(squadText).toContain(done);
    // Another metric and one athlete's eight weeks.
    await page.getByRole("button", { name: "sRPE" }).click();
    await page.getByTestId("plan-actual-who").selectOption(String(dto.athletes[0].id));
    await page.getByTestId("plan-actual-chart").locator("svg").first().waitFor();
    await screenshot(page, "plan-vs-actual");
    expect(await seriousAxeViolations(page)).toEqual([]);
  }, 60_000);

  it("both screens fit a 390 px phone without sideways scrolling and stay axe-clean", async () => {
    const phone = await browser.newPage({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    await signIn(phone, app, coach.email);
    await phone.goto(`${app.url}/home`);
    await phone.getByTestId("coach-today").waitFor();
    expect(await noSidewaysScroll(phone)).toBe(true);
    expect(await seriousAxeViolations(phone)).toEqual([]);
    await screenshot(phone, "coach-today-390");
    await phone.goto(`${app.url}/plan-vs-actual`);
    await phone.getByTestId("plan-actual-table").waitFor();
    await phone.getByTestId("plan-actual-chart").locator("svg").first().waitFor();
    expect(await noSidewaysScroll(phone)).toBe(true);
    // The table itself fits too: a phone shows it whole, not behind a sideways scroll of its own.
    const fits = await phone
      .getByTestId("plan-actual-table")
      .evaluate((t) => t.parentElement!.scrollWidth <= t.parentElement!.clientWidth);
    expect(fits).toBe(true);
    expect(await seriousAxeViolations(phone)).toEqual([]);
    await screenshot(phone, "plan-vs-actual-390");
    await phone.close();
  }, 120_000);
  it("an athlete's log note reaches the coach's Today and, when it speaks of pain, the physio's squad status", async () => {
    const { today } = (await (await api.fetch(`/api/teams/${teamId}/load?view=projected`)).json()) as SquadWeek;
    const db = await openDatabase(app.dbPath);
    const [maya] = (
      await db.query(
        "SELECT a.id AS id, a.name AS name FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
        { replacements: [MAYA] },
      )
    )[0] as { id: number; name: string }[];
    // Her latest published session of yesterday or today (logs close 48 hours after the session) not logged yet.
    const [session] = (
      await db.query(
        "SELECT s.id AS id FROM planned_sessions s LEFT JOIN session_logs l ON l.session_id = s.id " +
          "WHERE s.athlete_id = ? AND s.status = 'published' AND s.date BETWEEN ? AND ? AND l.id IS NULL " +
          "ORDER BY s.date DESC LIMIT 1",
        { replacements: [maya.id, addDays(today, -1), today] },
      )
    )[0] as { id: number }[];
    await db.close();
    expect(session).toBeDefined();
    const athlete = await apiSession(app, MAYA);
    const res = await athlete.fetch(`/api/sessions/${session.id}/log`, {
      method: "PUT",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ completion: "yes", rpe: 6, minutes: 50, notes: NOTE }),
    });
    expect(res.status, await res.clone().text()).toBe(200);

    await page.goto(`${app.url}/home`);
    const item = page.getByTestId("today-note").filter({ hasText: NOTE });
    await item.waitFor();
    expect(await item.textContent()).toContain(maya.name);
    expect(await item.getAttribute("href")).toBe(`/status/${maya.id}#session-${session.id}`);
    await item.click();
    await page.waitForURL(new RegExp(`/status/${maya.id}#session-${session.id}$`));
    expect(await page.locator(`#session-${session.id}`).textContent()).toContain(NOTE);

    const physio = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(physio, app, PHYSIO);
    await physio.goto(`${app.url}/status`);
    const painNote = physio.getByTestId("pain-note").filter({ hasText: NOTE });
    await painNote.waitFor();
    expect(await painNote.getAttribute("href")).toBe(`/status/${maya.id}#session-${session.id}`);
    expect(await noSidewaysScroll(physio)).toBe(true);
    expect(await seriousAxeViolations(physio)).toEqual([]);
    await screenshot(physio, "physio-pain-notes");
    await physio.close();
  }, 90_000);

  it("the coach's athlete page shows plan versus actual week by week, the handler's figures", async () => {
    const dto = (await (await api.fetch(`/api/teams/${teamId}/plan-vs-actual`)).json()) as PlanActual;
    const one = dto.athletes[0];
    await page.goto(`${app.url}/load/${one.id}`);
    const section = page.getByTestId("athlete-plan-actual");
    await section.waitFor();
    await section.getByTestId("plan-actual-chart").locator("svg").first().waitFor();
    const rows = section.getByTestId("athlete-plan-actual-week");
    // Newest week first, the same weeks and HSR metres done as the squad's plan-versus-actual handler.
    const weeks = await rows.evaluateAll((els) => els.map((e) => e.getAttribute("data-week")));
    expect(weeks).toEqual(dto.weeks.slice().reverse());
    const done = await section.getByTestId("athlete-plan-actual-done").allTextContents();
    expect(done).toEqual(
      one.weeks
        .slice()
        .reverse()
        .map((w) => formatNumber(w.done.hsrM, 0)),
    );
    await section.getByRole("button", { name: "sRPE" }).click();
    const doneSrpe = await section.getByTestId("athlete-plan-actual-done").allTextContents();
    expect(doneSrpe).toEqual(
      one.weeks
        .slice()
        .reverse()
        .map((w) => formatNumber(w.done.srpe, 0)),
    );
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "athlete-plan-actual");

    const phone = await browser.newPage({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    await signIn(phone, app, coach.email);
    await phone.goto(`${app.url}/load/${one.id}`);
    await phone.getByTestId("athlete-plan-actual-table").waitFor();
    expect(await noSidewaysScroll(phone)).toBe(true);
    const fits = await phone
      .getByTestId("athlete-plan-actual-table")
      .evaluate((t) => t.parentElement!.scrollWidth <= t.parentElement!.clientWidth);
    expect(fits).toBe(true);
    expect(await seriousAxeViolations(phone)).toEqual([]);
    await phone.close();
  }, 120_000);
});
