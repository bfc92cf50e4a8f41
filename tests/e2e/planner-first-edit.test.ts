import { DateTime } from "luxon";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { DEMO_STAFF } from "@/lib/seed/demo-club";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { PlanWeek } from "@/lib/plan/types";
import { describeBrowser, launchBrowser, signIn, startApp, type App } from "./harness";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;

// Three weeks ahead of the demo's plan: an empty week, so every card in it comes from this file.
const thisWeek = startOfWeek(DateTime.now().setZone("Europe/London").toISODate()!, 1);
const week = addDays(thisWeek, 21);
const day = (i: number) => addDays(week, i);

const row = (page: Page, athleteId: number) =>
  page.locator(`[data-testid="athlete-row"][data-athlete-id="${athleteId}"]`);
const cell = (page: Page, athleteId: number, date: string) =>
  page.locator(`[data-testid="day-cell"][data-athlete-id="${athleteId}"][data-date="${date}"]`);
const cards = (page: Page, athleteId: number, date: string) => cell(page, athleteId, date).getByTestId("session-card");
const srpe = async (page: Page, athleteId: number) =>
  Number(await row(page, athleteId).getByTestId("total-srpe").getAttribute("data-value"));
const notice = (page: Page) => page.getByTestId("plan-notice");

async function settled(page: Page) {
  await page.waitForFunction(
    () =>
      !document.querySelector('[data-pending="true"]') &&
      document.querySelector('[data-testid="planner"]')?.getAttribute("data-save-state") === "idle",
  );
}

/** A blank session saved through the API, before the page that is tested is opened. */
async function createSession(page: Page, teamId: string, athleteId: number, date: string, title: string) {
  const body = {
    from: "blank",
    athleteId,
    date,
    startTime: "16:00",
    durationMin: 40,
    title,
    plannedRpe: 5,
    blocks: [],
  };
  const status = await page.evaluate(
    async ([url, b]) =>
      (
        await fetch(url as string, {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify(b),
        })
      ).status,
    [`/api/teams/${teamId}/sessions`, body] as const,
  );
  expect(status).toBe(201);
}

/** A fresh page load: the week comes from the server render, and nothing has been dragged yet. */
async function openPlan(page: Page, app: App) {
  await page.goto(`${app.url}/plan?week=${week}`);
  await page.locator('[data-testid="planner"][data-ready="true"]').waitFor();
  await page.getByTestId("plan-grid").waitFor();
}

/** Edits a card's minutes (and start time, which the card shows); returns the minutes the editor opened with. */
async function editMinutes(page: Page, athleteId: number, date: string, minutes: number, startTime?: string) {
  await cards(page, athleteId, date).first().locator("button").first().click();
  await page.getByTestId("session-editor").waitFor();
  const before = Number(await page.locator("#s-duration").inputValue());
  await page.locator("#s-duration").fill(String(minutes));
  if (startTime) await page.locator("#s-start").fill(startTime);
  await page.getByTestId("save-session").click();
  await page.getByTestId("session-editor").waitFor({ state: "hidden" });
  await settled(page);
  return before;
}

describeBrowser("planner: the first edit after opening, and the copy preview", () => {
  let app: App;
  let browser: Browser;
  let page: Page;
  let plan: PlanWeek;
  let teamId: string;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1440, height: 1800 } });
    page.on("dialog", (d) => void d.accept());
    await signIn(page, app, coach.email);
    await openPlan(page, app);
    teamId = (await page.getByTestId("planner").getAttribute("data-team-id"))!;
    plan = await page.evaluate(
      async (url) => (await fetch(url)).json() as Promise<PlanWeek>,
      `/api/teams/${teamId}/plan?week=${week}`,
    );
  });
  /** A new session's card on a freshly opened plan: its button, which opens the editor and starts a drag. */
  const freshCard = async (athleteId: number, date: string, title: string) => {
    await createSession(page, teamId, athleteId, date, title);
    await openPlan(page, app);
    return cards(page, athleteId, date).first().locator("button").first();
  };
  afterAll(async () => {
    await page?.close();
    await browser?.close();
    await app?.stop();
  });

  it("shows the first edit after opening the plan, undoes it, and edits again without a false conflict", async () => {
    const athlete = plan.athletes[0].id;
    await createSession(page, teamId, athlete, day(1), "Edit first");
    await openPlan(page, app);
    await cards(page, athlete, day(1)).first().waitFor();
    const start = await srpe(page, athlete);

    // sRPE = RPE × minutes (Foster et al. 2001, J Strength Cond Res 15(1):109-115): 5 × 40 = 200 AU.
    expect(await editMinutes(page, athlete, day(1), 70, "17:30")).toBe(40);
    expect(await notice(page).getAttribute("data-tone")).toBe("saved");
    expect(await srpe(page, athlete)).toBe(start + 5 * 30);
    expect(await cards(page, athlete, day(1)).first().textContent()).toMatch(/17:30/);

    await page.getByTestId("undo").click();
    await page.locator('[data-testid="plan-notice"]', { hasText: "Undone" }).waitFor();
    await settled(page);
    expect(await srpe(page, athlete)).toBe(start);
    expect(await cards(page, athlete, day(1)).first().textContent()).toMatch(/16:00/);

    // The editor opens the values the undo restored, and the save is not taken for someone else's change.
    expect(await editMinutes(page, athlete, day(1), 55)).toBe(40);
    expect(await notice(page).getAttribute("data-tone")).toBe("saved");
    expect(await notice(page).textContent()).not.toMatch(/someone else/);
    expect(await srpe(page, athlete)).toBe(start + 5 * 15);
  });

  it("recomputes the copy preview when Alt is pressed and released during a keyboard drag", async () => {
    const athlete = plan.athletes[1].id;
    const handle = await freshCard(athlete, day(2), "Alt copy");
    await handle.focus();
    await page.keyboard.press("Space");
    await page.locator('[data-testid="drag-hint"][data-active="true"]').waitFor();
    const preview = page.getByTestId("drop-preview");
    // dnd-kit's keyboard sensor listens a moment after the drag starts: press again until the preview moves.
    for (let attempt = 0; attempt < 3; attempt++) {
      await page.keyboard.press("ArrowRight");
      if (
        await preview
          .filter({ hasText: "moved to" })
          .waitFor({ timeout: 2000 })
          .then(
            () => true,
            () => false,
          )
      )
        break;
    }
    const figures = async () => {
      const m = /sRPE (\d[\d,]*) → (\d[\d,]*) AU/.exec((await preview.textContent()) ?? "");
      expect(m).not.toBeNull();
      return [Number(m![1].replace(/,/g, "")), Number(m![2].replace(/,/g, ""))];
    };
    // A move within the athlete's week leaves the week's sRPE as it was.
    const [moveBefore, moveAfter] = await figures();
    expect(moveAfter).toBe(moveBefore);

    // Alt with no move: the same cell, previewed as a copy (one more 5 × 40 = 200 AU session).
    await page.keyboard.down("Alt");
    await preview.filter({ hasText: "Copy:" }).filter({ hasText: "copy of" }).waitFor();
    const [copyBefore, copyAfter] = await figures();
    expect(copyAfter - copyBefore).toBe(200);

    await page.keyboard.up("Alt");
    await preview.filter({ hasText: "moved to" }).waitFor();
    expect(await preview.textContent()).not.toMatch(/Copy:/);
    const [againBefore, againAfter] = await figures();
    expect(againAfter).toBe(againBefore);

    // Dropping with Alt held makes the copy the preview promised.
    await page.keyboard.down("Alt");
    await preview.filter({ hasText: "Copy:" }).waitFor();
    await page.keyboard.press("Space");
    await page.keyboard.up("Alt");
    await cards(page, athlete, day(3)).first().waitFor();
    await settled(page);
    expect(await cards(page, athlete, day(2)).count()).toBe(1);
    expect(await cards(page, athlete, day(3)).count()).toBe(1);
  });

  it("recomputes the copy preview when Alt is pressed over a cell with the mouse held still", async () => {
    const athlete = plan.athletes[2].id;
    const from = await freshCard(athlete, day(4), "Still mouse");
    await from.scrollIntoViewIfNeeded();
    const a = (await from.boundingBox())!;
    await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
    await page.mouse.down();
    await page.mouse.move(a.x + a.width / 2 + 8, a.y + a.height / 2 + 8, { steps: 3 });
    const b = (await cell(page, athlete, day(5)).boundingBox())!;
    await page.mouse.move(b.x + b.width / 2, b.y + Math.min(b.height / 2, 30), { steps: 12 });
    const preview = page.getByTestId("drop-preview");
    await preview.filter({ hasText: "moved to" }).waitFor();
    // No pointer move from here on: only the key changes what a drop would do.
    await page.keyboard.down("Alt");
    await preview.filter({ hasText: "Copy:" }).filter({ hasText: "copy of" }).waitFor();
    await page.keyboard.up("Alt");
    await preview.filter({ hasText: "moved to" }).waitFor();
    await page.mouse.up();
    await settled(page);
    expect(await cards(page, athlete, day(4)).count()).toBe(0);
    expect(await cards(page, athlete, day(5)).count()).toBe(1);
  });
});
