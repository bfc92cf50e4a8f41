import type { Locator, Page } from "playwright-core";

// The week plan as browser tests drive it: its cells and cards, a mouse drag, and waiting until saves settle.

export const cell = (page: Page, athleteId: number, date: string) =>
  page.locator(`[data-testid="day-cell"][data-athlete-id="${athleteId}"][data-date="${date}"]`);
export const cards = (page: Page, athleteId: number, date: string) =>
  cell(page, athleteId, date).getByTestId("session-card");

/** Mouse drag the way a person does it: press, move in steps (past dnd-kit's 5 px threshold), release. */
export async function mouseDrag(page: Page, from: Locator, to: Locator) {
  await from.scrollIntoViewIfNeeded();
  const a = (await from.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 8, a.y + a.height / 2 + 8, { steps: 3 });
  const b = (await to.boundingBox())!;
  await page.mouse.move(b.x + b.width / 2, b.y + Math.min(b.height / 2, 30), { steps: 12 });
  await page.mouse.move(b.x + b.width / 2 + 2, b.y + Math.min(b.height / 2, 30) + 1, { steps: 2 });
  await page.mouse.up();
}

/** Waits until no optimistic card is left and the planner is idle (saved and confirmed by the server). */
export async function settled(page: Page) {
  await page.waitForFunction(
    () =>
      !document.querySelector('[data-pending="true"]') &&
      document.querySelector('[data-testid="planner"]')?.getAttribute("data-save-state") === "idle",
    undefined,
    { timeout: 30_000 },
  );
}
