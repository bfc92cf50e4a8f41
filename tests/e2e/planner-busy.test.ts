// The planner while another process holds SQLite's write lock: a drop is shown at once, the server answers
// 503 "busy" (lib/db/busy.ts), and the grid rolls back and says nothing was saved; once the lock is gone the
// same drop saves. Pins the browser side of the busy answer (the HTTP side is in concurrency.test.ts).
import { DateTime } from "luxon";
import sqlite3 from "sqlite3";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { BUSY_MESSAGE } from "@/lib/db/busy";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { DEMO_STAFF } from "@/lib/seed/demo-club";
import type { PlanWeek } from "@/lib/plan/types";
import { describeBrowser, launchBrowser, signIn, startApp, type App } from "./harness";
import { cards, cell, mouseDrag as drag, settled } from "./planner-page";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;
// Four weeks ahead of the demo's plan: an empty week.
const week = addDays(startOfWeek(DateTime.now().setZone("Europe/London").toISODate()!, 1), 28);

const openRaw = (file: string) =>
  new Promise<sqlite3.Database>((resolve, reject) => {
    const conn = new sqlite3.Database(file, (err) => (err ? reject(err) : resolve(conn)));
  });
const exec = (conn: sqlite3.Database, sql: string) =>
  new Promise<void>((resolve, reject) => conn.exec(sql, (err) => (err ? reject(err) : resolve())));
const close = (conn: sqlite3.Database) =>
  new Promise<void>((resolve, reject) => conn.close((err) => (err ? reject(err) : resolve())));

describeBrowser("planner: a drop while the database is busy", () => {
  let app: App;
  let browser: Browser;
  let page: Page;
  let athleteId = 0;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1440, height: 1400 } });
    await signIn(page, app, coach.email);
    await page.goto(`${app.url}/plan?week=${week}`);
    await page.locator('[data-testid="planner"][data-ready="true"]').waitFor();
    const teamId = await page.getByTestId("planner").getAttribute("data-team-id");
    const plan = await page.evaluate(
      async (url) => (await fetch(url)).json() as Promise<PlanWeek>,
      `/api/teams/${teamId}/plan?week=${week}`,
    );
    athleteId = plan.athletes[0]!.id;
  });
  afterAll(async () => {
    await page?.close();
    await browser?.close();
    await app?.stop();
  });

  it("rolls the drop back and says the database was busy; the same drop saves once the lock is gone", async () => {
    const source = page.locator('[data-testid="template-card"][data-kind="max_velocity"]').first();
    const target = () => cards(page, athleteId, addDays(week, 2));
    const other = await openRaw(app.dbPath);
    await exec(other, "BEGIN IMMEDIATE");
    try {
      await drag(page, source, cell(page, athleteId, addDays(week, 2)));
      // Shown at once while the write waits for the lock.
      await target().first().waitFor();
      expect(await target().first().getAttribute("data-pending")).toBe("true");
      const notice = page.getByTestId("plan-notice");
      await notice.filter({ hasText: "was not saved" }).waitFor({ timeout: 20_000 });
      expect(await notice.getAttribute("data-tone")).toBe("refused");
      expect(await notice.textContent()).toContain(BUSY_MESSAGE);
      // Rolled back: the optimistic card is gone while the lock is still held.
      await page.waitForFunction(
        (sel) => document.querySelectorAll(sel).length === 0,
        `[data-testid="day-cell"][data-athlete-id="${athleteId}"][data-date="${addDays(week, 2)}"] [data-testid="session-card"]`,
      );
    } finally {
      await exec(other, "ROLLBACK");
      await close(other);
    }
    await settled(page);
    expect(await target().count()).toBe(0);
    // Health keeps saying busy briefly after a write gave up (lib/db/health.ts): wait for it before retrying.
    await expect
      .poll(async () => (await fetch(`${app.url}/api/health`)).status, { timeout: 10_000, interval: 250 })
      .toBe(200);
    await drag(page, source, cell(page, athleteId, addDays(week, 2)));
    await page.getByTestId("plan-notice").filter({ hasText: "Saved" }).waitFor({ timeout: 20_000 });
    await settled(page);
    expect(await target().count()).toBe(1);
  }, 90_000);
});
