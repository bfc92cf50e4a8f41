// The physio's day on the demo club, in Chromium against next start with mail on: the squad status on a phone
// (the seeded open spike alert and the athlete on modified training), the athlete's medical page (acknowledge and
// resolve the alert with a note, answer a log note), setting an athlete to modified training, and the coach's
// planner warning about it (with the coaches' "plan to change" mail through the outbox and SMTP). axe-core finds no
// serious or critical violation on the squad status and the athlete page.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { SPIKE_ATHLETE } from "@/lib/seed/seed-load";
import { MODIFIED_ATHLETE, PAIN_ATHLETE } from "@/lib/seed/seed-medical";
import { seriousAxeViolations } from "./axe";
import { describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const PHYSIO = "physio@harbourvale.test";
const COACH = "coach@harbourvale.test";
// A senior sprinter no other browser test plans for; her next sessions run faster than modified training allows.
const EASED = "Saoirse Lindqvist";

describeBrowser("physio squad status journey", () => {
  let app: MailApp;
  let browser: Browser;
  let ids: Record<string, number>;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    const rows = await app.query<{ id: number; name: string }>("SELECT id, name FROM athletes");
    ids = Object.fromEntries(rows.map((r) => [r.name, r.id]));
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  const noSidewaysScroll = (page: Page) =>
    page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

  it("on a phone, the squad status shows the seeded alert and modified athlete, filters and sorts", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, PHYSIO);
    await page.goto(`${app.url}/status`);
    const table = page.getByTestId("squad-status-table");
    await table.waitFor();
    const row = (name: string) => page.locator(`[data-testid="status-row"][data-athlete="${name}"]`);
    expect(await row(MODIFIED_ATHLETE).getByTestId("availability-level").getAttribute("data-level")).toBe("modified");
    expect(await row(SPIKE_ATHLETE).textContent()).toMatch(/\d+ open/);
    // The seeded pain report on his latest log, in the squad's row.
    expect(await row(PAIN_ATHLETE).textContent()).toContain("Calf 3/10");
    // Sorted by what needs attention: the athlete with the open alert comes first.
    expect(await page.getByTestId("status-row").first().getAttribute("data-athlete")).toBe(SPIKE_ATHLETE);
    expect(await noSidewaysScroll(page)).toBe(true);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "physio-status-phone");

    await page.getByTestId("status-filter-level").selectOption("modified");
    await expect.poll(() => page.getByTestId("status-row").count()).toBe(1);
    expect(await page.getByTestId("status-row").first().getAttribute("data-athlete")).toBe(MODIFIED_ATHLETE);
    await page.getByTestId("status-filter-level").selectOption("");
    await page.getByTestId("status-filter-attention").check();
    await expect.poll(() => page.getByTestId("status-row").count()).toBe(1);
    await page.getByTestId("status-filter-attention").uncheck();
    await page.getByTestId("status-sort").selectOption("name");
    const names = await page
      .getByTestId("status-row")
      .evaluateAll((els) => els.map((e) => e.getAttribute("data-athlete")));
    expect(names).toEqual([...names].sort((a, b) => (a ?? "").localeCompare(b ?? "")));
    await page.close();
  }, 90_000);

  it("the athlete page: acknowledge and resolve the spike with a note; axe finds nothing serious", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, PHYSIO);
    await page.goto(`${app.url}/status`);
    await page
      .locator(`[data-testid="status-row"][data-athlete="${SPIKE_ATHLETE}"]`)
      .getByTestId("status-athlete-link")
      .click();
    await page.waitForURL(new RegExp(`/status/${ids[SPIKE_ATHLETE]}$`));
    const card = page.getByTestId("alert-card").filter({ hasText: "Spike" }).first();
    await card.waitFor();
    await page.getByTestId("next-days").waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await card.getByRole("button", { name: "Acknowledge" }).click();
    await card.getByLabel("Note (optional)").fill("Talking to the coach about next week.");
    await card.getByTestId("alert-acknowledge-form").getByRole("button", { name: "Acknowledge" }).click();
    await expect.poll(() => card.getAttribute("data-status")).toBe("acknowledged");
    await card.getByRole("button", { name: "Resolve…" }).click();
    await card.getByLabel("How was it handled?").fill("Coach halves Tuesday's volume.");
    await card.getByTestId("alert-resolve-form").getByRole("button", { name: "Resolve" }).click();
    await expect.poll(() => card.getAttribute("data-status")).toBe("resolved");
    expect(await card.getByTestId("alert-note").textContent()).toContain("Coach halves Tuesday's volume.");
    const [stored] = await app.query<{ status: string }>(
      "SELECT status FROM alerts WHERE athlete_id = ? AND kind = 'spike'",
      [ids[SPIKE_ATHLETE]],
    );
    expect(stored.status).toBe("resolved");
    await screenshot(page, "physio-athlete-page");
    await page.close();
  }, 90_000);

  it("the physio sets an athlete to modified training, and the coach's planner warns about her sessions", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, PHYSIO);
    await page.goto(`${app.url}/status/${ids[EASED]}`);
    const form = page.getByTestId("availability-form");
    await form.waitFor();
    await form.getByTestId("availability-level-input").selectOption("modified");
    await form.getByTestId("availability-note").fill("Tight calf after Saturday. Tempo and strength fine.");
    await form.getByTestId("availability-save").click();
    const message = form.getByTestId("availability-message");
    await message.getByText("Saved: Modified training").waitFor();
    expect(await message.textContent()).toMatch(/already planned break it: the coaches were told/);
    await expect
      .poll(() => page.getByTestId("availability-level").first().getAttribute("data-level"), { timeout: 15_000 })
      .toBe("modified");
    expect(await noSidewaysScroll(page)).toBe(true);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await page.close();

    const mail = await app.waitForMail(COACH, (m) => m.subject.startsWith(`Plan to change: ${EASED}`));
    expect(mail.text).toContain("Running at most 85% of vmax");

    const coach = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(coach, app, COACH);
    await coach.goto(`${app.url}/plan`);
    const athleteRow = coach.locator("tr").filter({ hasText: EASED }).first();
    await athleteRow.getByTestId("row-restriction").waitFor();
    expect(await athleteRow.getByTestId("row-restriction").textContent()).toMatch(/Running at most 85% of vmax/);
    await screenshot(coach, "coach-planner-modified");
    await coach.close();
  }, 90_000);
});
