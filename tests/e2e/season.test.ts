// The coach's season journey in Chromium against next start on the demo club: add a phase, preview five draft
// weeks from one week (+10 % for three weeks, then a 40 % unload) in the grid before writing them, write them and
// find the previewed figures, see the forecast warn about the week that jumps after the unload, fix it by
// dragging a block onto the unload week in the week plan and see the warning clear; writing the weeks again with
// a lighter unload keeps it clear. Far-future weeks keep the demo's own plan out of
// the figures. axe on the screen; no sideways scroll on a phone.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { addDays, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { cell as dayCell, mouseDrag, settled } from "./planner-page";
import { startMailApp, type MailApp } from "./notices-app";

const HEAD = "head.coach@harbourvale.test";

describeBrowser("the season view", () => {
  let app: MailApp;
  let browser: Browser;
  let source: string;
  let mayaId: number;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    const today = new Date().toLocaleDateString("en-CA", { timeZone: "Europe/London" });
    source = shiftWeek(startOfWeek(today, 1), 30);
    const head = await apiSession(app, HEAD);
    const [maya] = await app.query<{ id: number; team_id: number }>(
      "SELECT id, team_id FROM athletes WHERE name LIKE 'Maya%'",
    );
    const team = { id: maya.team_id };
    mayaId = maya.id;
    for (const day of [1, 3]) {
      const res = await head.fetch(`/api/teams/${team.id}/sessions`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: app.url },
        body: JSON.stringify({
          from: "blank",
          athleteId: maya.id,
          date: addDays(source, day),
          title: "Speed",
          durationMin: 60,
          plannedRpe: 7,
          blocks: [
            {
              kind: "max_velocity",
              title: "Flying 30s",
              running: { sets: 2, reps: 5, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
              drills: null,
              notes: null,
            },
          ],
        }),
      });
      expect(res.status).toBe(201);
    }
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  async function fill(page: Page, unloadPct: string) {
    const form = page.getByTestId("progression-form");
    await form.getByLabel("Copy the week of").fill(source);
    await form.getByLabel("Start in the week of").fill(shiftWeek(source, 1));
    await form.getByLabel("Weeks", { exact: true }).fill("5");
    await form.getByLabel("Rise each week (%)").fill("10");
    await form.getByLabel("Build weeks").fill("3");
    await form.getByLabel("Unload cut (%)").fill(unloadPct);
    return form;
  }
  async function write(page: Page, unloadPct: string) {
    const form = await fill(page, unloadPct);
    await form.getByRole("button", { name: "Write draft weeks" }).click();
    await form.getByTestId("progression-message").getByText("10 draft sessions written over 5 weeks").waitFor();
  }

  it("adds a phase, writes weeks, warns about the jump after the unload and clears it", async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, app, HEAD);
    await page.goto(`${app.url}/season?from=${source}`);
    await page.getByTestId("season-grid").waitFor();

    const phase = page.getByTestId("phase-form");
    await phase.getByLabel("Name").fill("Speed build");
    await phase.getByLabel("Kind").selectOption({ label: "Specific preparation" });
    await phase.getByLabel("First day").fill(shiftWeek(source, 1));
    await phase.getByLabel("Last day").fill(addDays(shiftWeek(source, 5), 6));
    await phase.locator("#target-srpe-min").fill("600");
    await phase.locator("#target-srpe-max").fill("5000");
    await phase.getByRole("button", { name: "Add phase" }).click();
    await page.getByTestId("season-phases").getByText("Speed build · Specific preparation").waitFor();

    // Before anything is written: with the preview on, the grid and the warnings show the weeks as they would stand
    // (worked out in the page), and follow each change to the rule.
    const form = await fill(page, "40");
    await form.getByTestId("progression-preview-toggle").check();
    await page.getByTestId("season-preview").waitFor();
    const mayaCell = page
      .locator(`[data-testid=season-row][data-athlete-id="${mayaId}"]`)
      .locator(`[data-testid=season-cell][data-week="${shiftWeek(source, 5)}"]`);
    await mayaCell.and(page.locator('[data-preview="true"]')).waitFor();
    const jump = page.getByTestId("season-warning").filter({ hasText: "after an unload week" });
    await jump.waitFor();
    const previewed = await mayaCell.getAttribute("data-ratio");
    await screenshot(page, "season-preview");
    await form.getByLabel("Unload cut (%)").fill("10");
    await page.getByTestId("no-season-warnings").waitFor();
    await form.getByLabel("Unload cut (%)").fill("40");
    await jump.waitFor();
    expect(await mayaCell.getAttribute("data-ratio")).toBe(previewed);
    expect(await seriousAxeViolations(page)).toEqual([]);

    await write(page, "40");
    await page.getByTestId("season-preview").waitFor({ state: "detached" });
    await jump.waitFor();
    // The written weeks are the previewed ones: the same ratio, no longer marked.
    await mayaCell.and(page.locator(":not([data-preview])")).waitFor();
    expect(await mayaCell.getAttribute("data-ratio")).toBe(previewed);
    expect(await jump.textContent()).toMatch(/^Maya/);
    const cell = page.locator(`[data-testid=season-row] [data-week="${shiftWeek(source, 5)}"]`).first();
    expect(await cell.getAttribute("href")).toBe(`/plan?week=${shiftWeek(source, 5)}`);
    await screenshot(page, "season-warned");
    expect(await seriousAxeViolations(page)).toEqual([]);

    // The fix a coach makes by hand: more work in the unload week, so the week after no longer jumps.
    const unloadWeek = shiftWeek(source, 4);
    await page.goto(`${app.url}/plan?week=${unloadWeek}`);
    await page.getByTestId("planner").waitFor();
    const shelfBlock = page.locator('[data-testid="template-card"][data-kind="max_velocity"]').first();
    const target = dayCell(page, mayaId, addDays(unloadWeek, 2));
    // The row shows its week against the phase's sRPE target, from the same figure as the row's total.
    const row = page.locator(`[data-testid="athlete-row"][data-athlete-id="${mayaId}"]`).first();
    const againstTarget = async () => {
      const total = Number(await row.getByTestId("total-srpe").getAttribute("data-value"));
      const check = row.getByTestId("row-target").locator('[data-metric="srpe"]');
      expect(Number(await check.getAttribute("data-value"))).toBe(total);
      expect(await check.getAttribute("data-standing")).toBe(total < 600 ? "below" : "within");
      return total;
    };
    await row.getByTestId("row-target").getByText("Speed build target").waitFor();
    const before = await againstTarget();
    await mouseDrag(page, shelfBlock, target);
    await settled(page);
    await target.getByTestId("session-card").first().waitFor();
    expect(await againstTarget()).toBeGreaterThan(before);
    await page.goto(`${app.url}/season?from=${source}`);
    await page.getByTestId("season-grid").waitFor();
    await page.getByTestId("no-season-warnings").waitFor();

    await write(page, "10");
    await page.getByTestId("no-season-warnings").waitFor();
    await page.close();
  }, 180_000);

  it("adds a meet for one athlete and a phase for one group, and shows for whom", async () => {
    const [group] = await app.query<{ id: number; name: string }>(
      `SELECT g.id, g.name FROM training_groups g JOIN athletes a ON a.group_id = g.id WHERE a.id = ${mayaId}`,
    );
    const [maya] = await app.query<{ name: string }>(`SELECT name FROM athletes WHERE id = ${mayaId}`);
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, app, HEAD);
    await page.goto(`${app.url}/season?from=${source}`);
    await page.getByTestId("season-grid").waitFor();

    const meet = page.getByTestId("meet-form");
    await meet.getByLabel("Meet").fill("Harbour indoor 60");
    await meet.getByLabel("Date").fill(addDays(shiftWeek(source, 2), 5));
    await meet.getByLabel("Priority").selectOption("A");
    await meet.getByLabel("For", { exact: true }).selectOption({ label: maya.name });
    await meet.getByRole("button", { name: "Add meet" }).click();
    await meet.getByText("Meet added").waitFor();
    const shown = page.getByTestId("season-meet").filter({ hasText: "Harbour indoor 60" });
    await shown.waitFor();
    expect(await shown.textContent()).toContain(maya.name);
    const [stored] = await app.query<{ athlete_id: number; group_id: number | null }>(
      "SELECT athlete_id, group_id FROM meets WHERE name = 'Harbour indoor 60'",
    );
    expect(stored).toEqual({ athlete_id: mayaId, group_id: null });

    const phase = page.getByTestId("phase-form");
    await phase.getByLabel("Name").fill("Group speed block");
    await phase.getByLabel("Kind").selectOption({ label: "Pre-competition" });
    await phase.getByLabel("First day").fill(shiftWeek(source, 6));
    await phase.getByLabel("Last day").fill(addDays(shiftWeek(source, 8), 6));
    await phase.getByLabel("For", { exact: true }).selectOption({ label: group.name });
    await phase.getByRole("button", { name: "Add phase" }).click();
    await phase.getByText("Phase added").waitFor();
    await page.getByTestId("group-phase").filter({ hasText: "Group speed block" }).waitFor();
    await page
      .getByTestId("season-phase")
      .filter({ hasText: `for ${group.name}` })
      .waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await page.close();
  }, 120_000);

  it("prints the season in pages of eight weeks with every athlete and none of the screen's controls", async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, app, HEAD);
    await page.goto(`${app.url}/season?from=${source}`);
    await page.getByTestId("season-grid").waitFor();
    const athletes = await page.getByTestId("season-row").count();
    await page.emulateMedia({ media: "print" });
    const sheet = page.getByTestId("season-print");
    await sheet.waitFor();
    expect(await page.getByTestId("season-grid").isVisible()).toBe(false);
    expect(await page.getByTestId("progression-form").isVisible()).toBe(false);
    expect(await page.getByRole("navigation").first().isVisible()).toBe(false);
    // 16 weeks on screen: two pages of eight.
    expect(await sheet.getByTestId("season-print-page").count()).toBe(2);
    expect(await sheet.getByTestId("season-print-row").count()).toBe(athletes * 2);
    expect(await sheet.textContent()).toContain("monitoring aids, not diagnoses");
    const cut = await sheet.evaluate((el) =>
      [...el.querySelectorAll<HTMLElement>("th, td")]
        .filter((c) => c.scrollWidth > c.clientWidth + 1 || c.scrollHeight > c.clientHeight + 1)
        .map((c) => c.innerText.slice(0, 40)),
    );
    expect(cut).toEqual([]);
    const pdf = await page.pdf({ format: "A4", landscape: true, preferCSSPageSize: true });
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    await page.close();
  }, 120_000);

  it("fits a phone without sideways scrolling", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, HEAD);
    await page.goto(`${app.url}/season?from=${source}`);
    await page.getByTestId("season-grid").waitFor();
    const widths = await page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
    expect(widths[0]).toBeLessThanOrEqual(widths[1]);
    await page.close();
  }, 90_000);
});
