// Restrictions journey against the built app and the demo seed: the physio reads Dario's seeded restriction,
// sets a contact cap through the form (a field error first), sees it listed and lifts it; a coach reads the card
// without the form; an athlete sees their own current limits on /me.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { teamToday } from "@/lib/dates/zoned";
import { RESTRICTED_ATHLETE } from "@/lib/seed/seed-restrictions";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";

const PHYSIO = "physio@harbourvale.test";
const COACH = "coach@harbourvale.test";
const MAYA = "maya@harbourvale.test";

async function athletePath(page: Page, app: App, name: string): Promise<string> {
  await page.goto(`${app.url}/squad`);
  const href = await page.getByTestId("squad-list").getByRole("link", { name, exact: true }).getAttribute("href");
  expect(href).toMatch(/^\/squad\/\d+$/);
  return href!;
}

describeBrowser("restrictions journey", () => {
  let app: App;
  let browser: Browser;
  let darioPath = "";

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("the physio sees the seeded restriction, adds a contact cap through the form and lifts it", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await signIn(page, app, PHYSIO);
    darioPath = await athletePath(page, app, RESTRICTED_ATHLETE);
    await page.goto(`${app.url}${darioPath}`);
    const card = page.getByTestId("restrictions-card");
    await card.waitFor();
    const current = card.getByTestId("restrictions-current");
    await expect.poll(() => current.getByTestId("restriction-item").count()).toBe(1);
    const seeded = current.getByTestId("restriction-item").first();
    expect(await seeded.getByTestId("restriction-text").textContent()).toMatch(/^No max velocity, /);
    expect(await seeded.textContent()).toContain("no flying sprints until reviewed");
    expect(await seeded.textContent()).toContain("Set by Imogen Dervaux");
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
    // The seeded one is untouched.
    expect(await current.getByTestId("restriction-item").first().getByTestId("restriction-text").textContent()).toMatch(
      /^No max velocity, /,
    );
    await context.close();
  });

  it("a coach reads the card without the form or lift buttons", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, COACH);
    await page.goto(`${app.url}${await athletePath(page, app, RESTRICTED_ATHLETE)}`);
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
    await signIn(staff, app, PHYSIO);
    const mayaId = Number((await athletePath(staff, app, "Maya Okafor")).split("/").at(-1));
    await staff.close();
    const physio = await apiSession(app, PHYSIO);
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    const res = await physio.fetch(`/api/athletes/${mayaId}/restrictions`, {
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
    await signIn(page, app, MAYA);
    await page.goto(`${app.url}/me`);
    const mine = page.getByTestId("my-restrictions");
    await mine.waitFor();
    expect(await mine.textContent()).toContain("Limits from your medical staff");
    expect(await mine.getByTestId("my-restriction-item").count()).toBe(1);
    expect(await mine.textContent()).toContain("Running at most 85% of vmax");
    expect(await mine.textContent()).toMatch(/monitoring aids/);
    expect(await page.getByTestId("lift-restriction").count()).toBe(0);
    // Her own list over the API, but nobody else's.
    const maya = await apiSession(app, MAYA);
    expect((await maya.fetch(`/api/athletes/${mayaId}/restrictions`)).status).toBe(200);
    expect((await maya.fetch(`/api/athletes/${darioPath.split("/").at(-1)}/restrictions`)).status).toBe(404);
    await screenshot(page, "restrictions-athlete");
    await context.close();
  });
});
