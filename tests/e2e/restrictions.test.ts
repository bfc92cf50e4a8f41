// Restrictions journey against the built app, on a team of its own (so every count is this test's rows): the
// physio reads the restriction set before the test, sets a contact cap through the form (a field error first),
// sees it listed and lifts it; a coach reads the card without the form; an athlete sees their own current limits
// on /me.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";

const PHYSIO = "physio@limitstrack.test";
const COACH = "coach@limitstrack.test";
const BEN = "ben@limitstrack.test";
const ADA_NAME = "Ada Athlete";
const BEN_NAME = "Ben Athlete";

async function athletePath(page: Page, app: App, name: string): Promise<string> {
  await page.goto(`${app.url}/squad`);
  const href = await page.getByTestId("squad-list").getByRole("link", { name, exact: true }).getAttribute("href");
  expect(href).toMatch(/^\/squad\/\d+$/);
  return href!;
}

describeBrowser("restrictions journey", () => {
  let app: App;
  let browser: Browser;
  let adaPath = "";

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    const own = await createAppTeam(app.dbPath, { name: "Limits Track" });
    // Set before the journey, as a physio would have days ago: no max-velocity running for a week.
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    const physio = await apiSession(app, PHYSIO, TEST_PASSWORD);
    const res = await physio.fetch(`/api/athletes/${own.users["ada@limitstrack.test"].athleteId}/restrictions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        rule: "no_kind",
        blockKinds: ["max_velocity"],
        startsOn: addDays(today, -4),
        endsOn: addDays(today, 3),
        note: "Left hamstring tightness. Acceleration work to 20 m and tempo are fine; no flying sprints until reviewed.",
      }),
    });
    expect(res.status, await res.clone().text()).toBe(201);
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("the physio sees the earlier restriction, adds a contact cap through the form and lifts it", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await signIn(page, app, PHYSIO, TEST_PASSWORD);
    adaPath = await athletePath(page, app, ADA_NAME);
    await page.goto(`${app.url}${adaPath}`);
    const card = page.getByTestId("restrictions-card");
    await card.waitFor();
    const current = card.getByTestId("restrictions-current");
    await expect.poll(() => current.getByTestId("restriction-item").count()).toBe(1);
    const earlier = current.getByTestId("restriction-item").first();
    expect(await earlier.getByTestId("restriction-text").textContent()).toMatch(/^No max velocity, /);
    expect(await earlier.textContent()).toContain("no flying sprints until reviewed");
    expect(await earlier.textContent()).toContain("Set by Pia Physio");
    expect(await card.getByTestId("restriction-caution").textContent()).toMatch(/monitoring aids/);

    const form = card.getByTestId("restriction-form");
    await form.getByLabel("What to limit").selectOption("contact_cap");
    await form.getByLabel("Ground contacts per session, at most").fill("60");
    // No note yet: the shared schema answers in the form, on the note field.
    await form.getByTestId("restriction-save").click();
    await form.getByRole("alert").filter({ hasText: "Say why" }).waitFor();
    await form.getByLabel("Note for the coaches").fill("Sore left Achilles: low pogos only, no bounding.");
    await form.getByTestId("restriction-save").click();
    await form.getByTestId("restriction-form-message").getByText("Saved").waitFor();

    const added = current.getByTestId("restriction-item").filter({ hasText: "At most 60 ground contacts per session" });
    await added.waitFor();
    expect(await current.getByTestId("restriction-item").count()).toBe(2);
    await screenshot(page, "restrictions-physio");

    await added.getByTestId("lift-restriction").click();
    await added.getByTestId("lift-restriction-confirm").click();
    await expect.poll(() => current.getByTestId("restriction-item").count()).toBe(1);
    const past = card.getByTestId("restrictions-past");
    await past.locator("summary").click();
    await past
      .getByTestId("restriction-item")
      .filter({ hasText: "At most 60 ground contacts per session" })
      .filter({ hasText: "Lifted" })
      .waitFor();
    // The earlier one is untouched.
    expect(await current.getByTestId("restriction-item").first().getByTestId("restriction-text").textContent()).toMatch(
      /^No max velocity, /,
    );
    await context.close();
  });

  it("a coach reads the card without the form or lift buttons", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, COACH, TEST_PASSWORD);
    await page.goto(`${app.url}${await athletePath(page, app, ADA_NAME)}`);
    const card = page.getByTestId("restrictions-card");
    await card.getByTestId("restriction-item").first().waitFor();
    expect(await card.getByTestId("restriction-item").first().textContent()).toContain("No max velocity");
    expect(await card.getByTestId("restriction-form").count()).toBe(0);
    expect(await card.getByTestId("lift-restriction").count()).toBe(0);
    await card.getByTestId("override-log").waitFor();
    await screenshot(page, "restrictions-coach");
    await page.close();
  });

  it("an athlete sees their own current limits on /me, read-only", async () => {
    const staff = await browser.newPage();
    await signIn(staff, app, PHYSIO, TEST_PASSWORD);
    const benId = Number((await athletePath(staff, app, BEN_NAME)).split("/").at(-1));
    await staff.close();
    const physio = await apiSession(app, PHYSIO, TEST_PASSWORD);
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    const res = await physio.fetch(`/api/athletes/${benId}/restrictions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        rule: "max_intensity",
        maxPct: 85,
        startsOn: today,
        note: "Back from a calf strain: build up gradually.",
      }),
    });
    expect(res.status, await res.clone().text()).toBe(201);

    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await signIn(page, app, BEN, TEST_PASSWORD);
    await page.goto(`${app.url}/me`);
    const mine = page.getByTestId("my-restrictions");
    await mine.waitFor();
    expect(await mine.textContent()).toContain("Limits from your medical staff");
    expect(await mine.getByTestId("my-restriction-item").count()).toBe(1);
    expect(await mine.textContent()).toContain("Running at most 85% of vmax");
    expect(await mine.textContent()).toMatch(/monitoring aids/);
    expect(await page.getByTestId("lift-restriction").count()).toBe(0);
    // Her own list over the API, but nobody else's.
    const ben = await apiSession(app, BEN, TEST_PASSWORD);
    expect((await ben.fetch(`/api/athletes/${benId}/restrictions`)).status).toBe(200);
    expect((await ben.fetch(`/api/athletes/${adaPath.split("/").at(-1)}/restrictions`)).status).toBe(404);
    await screenshot(page, "restrictions-athlete");
    await context.close();
  });
});
