import { DateTime } from "luxon";
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { formatDayShort } from "@/lib/format/dates";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { PlanWeek } from "@/lib/plan/types";
import { join } from "node:path";
import {
  ARTIFACTS,
  apiSession,
  describeBrowser,
  launchBrowser,
  screenshot,
  signIn,
  startApp,
  type App,
} from "./harness";

const coach = DEMO_STAFF.find((s) => s.role === "coach")!;
const physio = DEMO_STAFF.find((s) => s.role === "physio")!;
const headCoach = DEMO_STAFF.find((s) => s.role === "head_coach")!;
const athlete = DEMO_ATHLETES.find((a) => a.email)!;

// Two weeks ahead of the demo's plan: an empty week, so every card in it comes from this test.
const thisWeek = startOfWeek(DateTime.now().setZone("Europe/London").toISODate()!, 1);
const week = addDays(thisWeek, 14);
const day = (i: number) => addDays(week, i);

/** Pointer drag the way a person does it: press, move in steps (past dnd-kit's 5 px threshold), release. */
async function drag(
  page: Page,
  from: Locator,
  to: Locator,
  { alt = false, hold }: { alt?: boolean; hold?: () => Promise<void> } = {},
) {
  await from.scrollIntoViewIfNeeded();
  const a = (await from.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 8, a.y + a.height / 2 + 8, { steps: 3 });
  const b = (await to.boundingBox())!;
  await page.mouse.move(b.x + b.width / 2, b.y + Math.min(b.height / 2, 30), { steps: 12 });
  if (alt) await page.keyboard.down("Alt");
  await page.mouse.move(b.x + b.width / 2 + 2, b.y + Math.min(b.height / 2, 30) + 1, { steps: 2 });
  if (hold) await hold();
  await page.mouse.up();
  if (alt) await page.keyboard.up("Alt");
}

const row = (page: Page, athleteId: number) =>
  page.locator(`[data-testid="athlete-row"][data-athlete-id="${athleteId}"]`);
const cell = (page: Page, athleteId: number, date: string) =>
  page.locator(`[data-testid="day-cell"][data-athlete-id="${athleteId}"][data-date="${date}"]`);
const cards = (page: Page, athleteId: number, date: string) => cell(page, athleteId, date).getByTestId("session-card");
const template = (page: Page, kind: string) =>
  page.locator(`[data-testid="template-card"][data-kind="${kind}"]`).first();
const srpe = async (page: Page, athleteId: number) =>
  Number(await row(page, athleteId).getByTestId("total-srpe").getAttribute("data-value"));

/** A viewport-only shot: a full-page one resizes the window, and dnd-kit cancels a drag on resize. */
const shotDuringDrag = (page: Page, name: string) => page.screenshot({ path: join(ARTIFACTS, `${name}.png`) });

/** Waits until no optimistic card is left and the grid is idle (saved and confirmed by the server). */
async function settled(page: Page) {
  await page.waitForFunction(
    () =>
      !document.querySelector('[data-pending="true"]') &&
      document.querySelector('[data-testid="planner"]')?.getAttribute("data-save-state") === "idle",
  );
}

describeBrowser("planner journeys", () => {
  let app: App;
  let browser: Browser;
  let plan: PlanWeek;
  let page: Page;
  const ids = (name: string) => plan.athletes.find((a) => a.name === name)!.id;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1440, height: 1800 } });
    page.on("dialog", (d) => void d.accept());
    await signIn(page, app, coach.email);
    await page.goto(`${app.url}/plan?week=${week}`);
    await page.getByTestId("plan-grid").waitFor();
    const teamId = await page.getByTestId("planner").getAttribute("data-team-id");
    plan = await page.evaluate(
      async (url) => (await fetch(url)).json() as Promise<PlanWeek>,
      `/api/teams/${teamId}/plan?week=${week}`,
    );
  });
  afterAll(async () => {
    await page?.close();
    await browser?.close();
    await app?.stop();
  });

  it("shows the week: ISO week number, days, groups, rows with totals, the shelf and the caution", async () => {
    expect(await page.getByTestId("iso-week").textContent()).toMatch(/^Week \d+/);
    expect(await page.getByTestId("day-heading").count()).toBe(7);
    // One row per group the team's plan API lists (not the demo seed's list).
    expect(plan.groups.length).toBeGreaterThan(0);
    expect(await page.getByTestId("group-row").count()).toBe(plan.groups.length);
    // One row per athlete the team's plan API lists (not the demo seed's list).
    expect(plan.athletes.length).toBeGreaterThan(0);
    expect(await page.getByTestId("athlete-row").count()).toBe(plan.athletes.length);
    expect(await page.getByTestId("template-card").count()).toBeGreaterThan(5);
    await page.getByTestId("load-caution").waitFor();
    await screenshot(page, "planner-empty-week");
    const current = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(current, app, coach.email);
    await current.goto(`${app.url}/plan`);
    await current.getByTestId("plan-grid").waitFor();
    expect(await current.getByTestId("session-card").count()).toBeGreaterThan(20);
    await screenshot(current, "planner-coach-week");
    await current.close();
  });

  it("drags a max-velocity template onto Maya's Tuesday and shows the card and the new totals", async () => {
    const maya = ids("Maya Okafor");
    const before = await srpe(page, maya);
    await drag(page, template(page, "max_velocity"), cell(page, maya, day(1)), {
      hold: async () => {
        await row(page, maya).locator('[data-testid="row-load"][data-previewing="true"]').waitFor({ timeout: 5000 });
        await shotDuringDrag(page, "planner-drag-preview");
      },
    });
    await cards(page, maya, day(1)).first().waitFor();
    await settled(page);
    expect(await cards(page, maya, day(1)).count()).toBe(1);
    expect(await cards(page, maya, day(1)).first().textContent()).toMatch(/Flying 30s/);
    // sRPE = RPE × minutes (Foster et al. 2001): the template's 8 × 70 = 560 AU.
    expect((await srpe(page, maya)) - before).toBe(560);
    await screenshot(page, "planner-after-drop");
  });

  it("moves it to Thursday", async () => {
    const maya = ids("Maya Okafor");
    await drag(page, cards(page, maya, day(1)).first().locator("button").first(), cell(page, maya, day(3)));
    await cards(page, maya, day(3)).first().waitFor();
    await settled(page);
    expect(await cards(page, maya, day(1)).count()).toBe(0);
    expect(await cards(page, maya, day(3)).count()).toBe(1);
  });

  it("copies with Alt held, and undoes the copy", async () => {
    const maya = ids("Maya Okafor");
    await drag(page, cards(page, maya, day(3)).first().locator("button").first(), cell(page, maya, day(5)), {
      alt: true,
    });
    await cards(page, maya, day(5)).first().waitFor();
    await settled(page);
    expect(await cards(page, maya, day(3)).count()).toBe(1);
    expect(await cards(page, maya, day(5)).count()).toBe(1);
    await page.getByTestId("undo").click();
    await page.waitForFunction(
      (sel) => document.querySelectorAll(sel).length === 0,
      `[data-testid="day-cell"][data-athlete-id="${maya}"][data-date="${day(5)}"] [data-testid="session-card"]`,
    );
    await settled(page);
    expect(await cards(page, maya, day(3)).count()).toBe(1);
  });

  it("drags a template onto a group's day: every athlete of the group gets it", async () => {
    const group = plan.groups.find((g) => g.name === "Junior sprint")!;
    await drag(
      page,
      template(page, "tempo"),
      page.locator(`[data-testid="group-cell"][data-group-id="${group.id}"][data-date="${day(2)}"]`),
    );
    await settled(page);
    for (const id of group.athleteIds) expect(await cards(page, id, day(2)).count()).toBe(1);
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, "planner-group-drop");
  });

  it("marks a drop that pushes ACWR over the spike threshold, before and after the drop", async () => {
    // A deliberately heavy block (RPE 10 × 180 min = 1,800 AU) on an athlete coming off an empty week.
    const api = await apiSession(app, coach.email);
    const made = await api.fetch(`/api/teams/${plan.teamId}/templates`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        kind: "speed_endurance",
        title: "Double speed endurance",
        running: { sets: 2, reps: 3, distanceM: 150, intensityPct: 90, start: "standing", runInM: 0, restSec: 600 },
        drills: null,
        notes: null,
        durationMin: 180,
        plannedRpe: 10,
      }),
    });
    expect(made.status).toBe(201);
    const { template: heavy } = (await made.json()) as { template: { id: number } };
    await page.reload();
    await page.getByTestId("plan-grid").waitFor();
    const callum = ids("Callum Strettin");
    const source = page.locator(`[data-testid="template-card"][data-template-id="${heavy.id}"]`);
    const warning = page.locator(`[data-testid="drop-warnings"][data-athlete-id="${callum}"] [data-kind="spike"]`);
    let warned = false;
    for (let i = 1; i < 7 && !warned; i++) {
      await drag(page, source, cell(page, callum, day(i)), {
        hold: async () => {
          await row(page, callum)
            .locator('[data-testid="row-load"][data-previewing="true"]')
            .waitFor({ timeout: 5000 });
          warned = (await warning.count()) > 0;
          if (warned) {
            expect(await warning.textContent()).toMatch(/at or above the spike threshold/);
            await shotDuringDrag(page, "planner-spike-warning");
          }
        },
      });
      await settled(page);
    }
    expect(warned).toBe(true);
    expect(await warning.count()).toBe(0);
    expect(await row(page, callum).getByTestId("acwr-badge").getAttribute("data-kind")).toBe("spike");
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, "planner-spike-after");
  });

  it("warns before a drop past a physio restriction, asks for a reason, and records the override", async () => {
    // The physio (through the API) rules out max-velocity running for Ruben for the whole test week.
    const ruben = ids("Ruben Astley");
    const staff = await apiSession(app, physio.email);
    const set = await staff.fetch(`/api/athletes/${ruben}/restrictions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        rule: "no_kind",
        blockKinds: ["max_velocity"],
        startsOn: day(0),
        endsOn: day(6),
        note: "Calf strain, grade 1: no flying sprints this week",
      }),
    });
    expect(set.status).toBe(201);
    await page.reload();
    await page.getByTestId("plan-grid").waitFor();
    expect(await row(page, ruben).getByTestId("row-restriction").textContent()).toMatch(/Physio restriction/);

    // Hovering says so before the drop; dropping asks why; "keep the plan" saves nothing. Ruben's row is the last
    // one: held near the window's bottom edge, the drag would scroll the page and the drop land on another row,
    // so the day is brought to the middle first (the shelf stays in view beside it).
    const target = cell(page, ruben, day(2));
    const centre = () => target.evaluate((el) => el.scrollIntoView({ block: "center" }));
    await centre();
    await drag(page, template(page, "max_velocity"), target, {
      hold: async () => {
        await page.getByTestId("drop-restriction").waitFor({ timeout: 5000 });
        expect(await page.getByTestId("drop-restriction").textContent()).toMatch(/No max velocity/);
        await shotDuringDrag(page, "planner-restriction-warning");
      },
    });
    const dialog = page.getByTestId("override-dialog");
    await dialog.getByTestId("override-hit").waitFor();
    expect(await dialog.getByTestId("override-hit").textContent()).toMatch(/Ruben Astley.*No max velocity/s);
    await dialog.getByTestId("override-cancel").click();
    await settled(page);
    expect(await cards(page, ruben, day(2)).count()).toBe(0);

    // Again, with a reason (a too-short one is refused in the form first).
    await centre();
    await drag(page, template(page, "max_velocity"), target);
    await dialog.getByTestId("override-reason").fill("ok");
    await dialog.getByTestId("override-confirm").click();
    await dialog.locator('[role="alert"]').waitFor();
    await dialog.getByTestId("override-reason").fill("Cleared by the physio at today's check; flys capped at 20 m");
    await screenshot(page, "planner-override-dialog");
    await dialog.getByTestId("override-confirm").click();
    await cards(page, ruben, day(2)).first().waitFor();
    await settled(page);
    expect(await cards(page, ruben, day(2)).first().getByTestId("card-restricted").count()).toBe(1);
    // Unmistakable, never colour alone: a thick dashed border and the words on the card.
    const past = cards(page, ruben, day(2)).first();
    expect(
      await past.evaluate((el) => [getComputedStyle(el).borderTopStyle, getComputedStyle(el).borderTopWidth]),
    ).toEqual(["dashed", "2px"]);
    expect(await past.getByTestId("card-restricted").textContent()).toContain("Past a physio limit");

    // The medical staff see the override with its reason, and have an alert for it.
    const list = (await (await staff.fetch(`/api/athletes/${ruben}/restrictions`)).json()) as {
      overrides: { reason: string; sessionDate: string }[];
    };
    expect(list.overrides).toEqual([
      expect.objectContaining({
        reason: "Cleared by the physio at today's check; flys capped at 20 m",
        sessionDate: day(2),
      }),
    ]);
    const alerts = (await (await staff.fetch(`/api/alerts?status=all&athleteId=${ruben}`)).json()) as {
      alerts: { kind: string }[];
    };
    expect(alerts.alerts.map((a) => a.kind)).toContain("restriction_override");
  }, 60_000);

  it("drags with the keyboard, and announces the drop's effect", async () => {
    const first = plan.groups[0].athleteIds[0];
    const handle = template(page, "acceleration").locator("button").first();
    await handle.focus();
    await page.keyboard.press("Space");
    await page.locator('[data-testid="drag-hint"][data-active="true"]').waitFor();
    // Each press moves one cell; the drop preview names the cell. dnd-kit's keyboard sensor starts listening a
    // moment after the drag begins (a timer), so a press that came too early is pressed again.
    const name = plan.athletes.find((a) => a.id === first)!.name;
    const pressTo = async (key: string, i: number) => {
      const where = `${name}'s ${formatDayShort(day(i))}`;
      for (let attempt = 0; attempt < 3; attempt++) {
        await page.keyboard.press(key);
        const reached = await page
          .getByTestId("drop-preview")
          .filter({ hasText: where })
          .waitFor({ timeout: 2000 })
          .then(
            () => true,
            () => false,
          );
        if (reached) return;
        console.warn(
          `keyboard drag: ${key} did not reach ${where} yet; pressing again ` +
            `(live region: ${await page.locator('[id^="DndLiveRegion"]').textContent()})`,
        );
      }
      throw new Error(`the keyboard drag did not reach ${where}`);
    };
    await pressTo("ArrowDown", 0); // from the shelf, the first press lands on the first athlete's first day
    await pressTo("ArrowRight", 1);
    await pressTo("ArrowRight", 2);
    expect(await page.locator('[id^="DndLiveRegion"]').textContent()).toMatch(/Dropping makes/);
    await shotDuringDrag(page, "planner-keyboard-drag");
    await page.keyboard.press("Space");
    await cards(page, first, day(2)).first().waitFor();
    await settled(page);
    expect(await cards(page, first, day(2)).first().textContent()).toMatch(/Block starts|Crouch/);
  });

  it("opens a card in the editor, saves a new start time, and says when someone else changed it (409)", async () => {
    const maya = ids("Maya Okafor");
    await cards(page, maya, day(3)).first().locator("button").first().click();
    await page.getByTestId("session-editor").waitFor();
    await screenshot(page, "planner-session-editor");
    await page.locator("#s-start").fill("09:15");
    await page.getByTestId("save-session").click();
    await page.getByTestId("session-editor").waitFor({ state: "hidden" });
    await settled(page);
    expect(await cards(page, maya, day(3)).first().textContent()).toMatch(/09:15/);

    // Another coach moves the same session; this page still holds the old version.
    const id = Number(await cards(page, maya, day(3)).first().getAttribute("data-session-id"));
    const other = await apiSession(app, headCoach.email);
    const current = (await (await other.fetch(`/api/sessions/${id}`)).json()) as { session: { version: number } };
    const res = await other.fetch(`/api/sessions/${id}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ version: current.session.version, startTime: "07:00" }),
    });
    expect(res.status).toBe(200);
    await drag(page, cards(page, maya, day(3)).first().locator("button").first(), cell(page, maya, day(4)));
    await page.locator('[data-testid="plan-notice"][data-tone="refused"]').waitFor();
    expect(await page.getByTestId("plan-notice").textContent()).toMatch(/someone else changed/);
    await settled(page);
    expect(await cards(page, maya, day(4)).count()).toBe(0);
    expect(await cards(page, maya, day(3)).first().textContent()).toMatch(/07:00/);
  });

  it("edits a template with a live load preview", async () => {
    await page.getByTestId("new-template").click();
    await page.getByTestId("template-editor").waitFor();
    await page.getByLabel("Title").fill("Flying 20s");
    await page.getByLabel("Distance (m)").fill("20");
    await page.getByTestId("template-preview").waitFor();
    expect(await page.getByTestId("preview-hsr").textContent()).toMatch(/\d+ m/);
    await screenshot(page, "planner-template-editor");
    await page.getByTestId("save-template").click();
    await page.getByTestId("template-editor").waitFor({ state: "hidden" });
    await page.getByTestId("shelf-search").fill("flying 20");
    expect(await page.getByTestId("template-card").count()).toBe(1);
    await page.getByTestId("shelf-search").fill("");
  });

  it("saves an edit of a template, and says so when another coach saved it first (409)", async () => {
    const editor = page.getByTestId("template-editor");
    await page.getByTestId("shelf-search").fill("flying 20");
    const card = page.getByTestId("template-card").first();
    const id = Number(await card.getAttribute("data-template-id"));
    await card.getByTestId("edit-template").click();
    await editor.waitFor();
    await page.getByLabel("Title").fill("Flying 20s, relaxed");
    await page.getByTestId("save-template").click();
    await editor.waitFor({ state: "hidden" });
    await page.getByTestId("shelf-search").fill("relaxed");
    expect(await page.getByTestId("template-card").count()).toBe(1);

    await page.getByTestId("template-card").first().getByTestId("edit-template").click();
    await editor.waitFor();
    const other = await apiSession(app, coach.email);
    const { template: read } = (await (await other.fetch(`/api/templates/${id}`)).json()) as {
      template: Record<string, unknown>;
    };
    const saved = await other.fetch(`/api/templates/${id}`, {
      method: "PUT",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ ...read, title: "Flying 20s, the other coach's" }),
    });
    expect(saved.status).toBe(200);
    await page.getByLabel("Title").fill("Flying 20s, mine");
    await page.getByTestId("save-template").click();
    await editor.getByText("Someone changed this block").waitFor();
    await editor.getByRole("button", { name: "Cancel" }).click();
    await page.getByTestId("shelf-search").fill("flying 20");
    await page.getByTestId("template-card").getByText("Flying 20s, the other coach's").waitFor();
    await page.getByTestId("shelf-search").fill("");
  });

  it("folds a group, walks the weeks, and runs the week tools: publish, copy to next week, clear", async () => {
    const group = plan.groups[0];
    const before = await page.getByTestId("athlete-row").count();
    await page.locator(`[data-testid="group-row"][data-group-id="${group.id}"] button`).first().click();
    expect(await page.getByTestId("athlete-row").count()).toBe(before - group.athleteIds.length);
    await page.locator(`[data-testid="group-row"][data-group-id="${group.id}"] button`).first().click();
    expect(await page.getByTestId("athlete-row").count()).toBe(before);

    const drafts = await page.locator('[data-testid="session-card"][data-status="draft"]').count();
    expect(drafts).toBeGreaterThan(0);
    await page.getByTestId("publish-week").click();
    await page.getByTestId("confirm-dialog").waitFor();
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: join(ARTIFACTS, "planner-confirm-publish.png") });
    await page.getByTestId("confirm-yes").click();
    await page
      .locator('[data-testid="plan-notice"]')
      .filter({ hasText: `Published ${drafts} session` })
      .waitFor();
    await settled(page);
    expect(await page.locator('[data-testid="session-card"][data-status="draft"]').count()).toBe(0);

    const total = await page.getByTestId("session-card").count();
    await page.getByTestId("copy-week").click();
    await page.getByTestId("confirm-yes").click();
    await page.locator('[data-testid="plan-notice"]').filter({ hasText: "to next week as drafts" }).waitFor();
    await page.getByTestId("next-week").click();
    await page.waitForFunction(
      (w) => document.querySelector('[data-testid="planner"]')?.getAttribute("data-week") === w,
      day(7),
    );
    await page.getByTestId("plan-grid").waitFor();
    await settled(page);
    expect(await page.locator('[data-testid="session-card"][data-status="draft"]').count()).toBe(total);
    await page.getByTestId("clear-week").click();
    await page.getByTestId("confirm-yes").click();
    await page.locator('[data-testid="plan-notice"]').filter({ hasText: "Cleared the week" }).waitFor();
    await settled(page);
    expect(await page.getByTestId("session-card").count()).toBe(0);

    await page.getByTestId("pick-date").fill(day(2));
    await page.getByRole("button", { name: "Go", exact: true }).click();
    await page.waitForFunction(
      (w) => document.querySelector('[data-testid="planner"]')?.getAttribute("data-week") === w,
      week,
    );
    await settled(page);
    expect(await page.locator('[data-testid="session-card"][data-status="published"]').count()).toBe(total);
  });

  it("lets a physio read the whole squad's week without changing it", async () => {
    const p = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(p, app, physio.email);
    await p.goto(`${app.url}/plan?week=${thisWeek}`);
    await p.getByTestId("plan-grid").waitFor();
    expect(await p.getByTestId("athlete-row").count()).toBe(plan.athletes.length);
    expect(await p.getByTestId("block-shelf").count()).toBe(0);
    expect(await p.getByTestId("undo").count()).toBe(0);
    // Cards are plain buttons that open the details: nothing says "draggable" to a reader or a screen reader.
    expect(await p.locator('[aria-roledescription="draggable"]').count()).toBe(0);
    await p.getByTestId("load-caution").waitFor();
    await p.getByTestId("session-card").first().locator("button").first().click();
    await p.getByTestId("session-details").waitFor();
    await screenshot(p, "planner-physio-details");
    await p.close();
  });

  it("does not let an athlete drag: one read-only row, and the API refuses writes", async () => {
    const p = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await signIn(p, app, athlete.email!);
    await p.goto(`${app.url}/plan?week=${thisWeek}`);
    await p.getByTestId("plan-grid").waitFor();
    expect(await p.getByTestId("athlete-row").count()).toBe(1);
    expect(await p.getByTestId("block-shelf").count()).toBe(0);
    await p.getByTestId("read-only").waitFor();
    const card = p.getByTestId("session-card").first();
    await card.waitFor();
    expect(await p.locator('[aria-roledescription="draggable"]').count()).toBe(0);
    const before = await p
      .getByTestId("session-card")
      .evaluateAll((els) =>
        els.map((e) => `${e.getAttribute("data-session-id")}@${e.closest("td")?.getAttribute("data-date")}`),
      );
    const target = p.locator('[data-testid="day-cell"]').last();
    await drag(p, card.locator("button").first(), target);
    await p.waitForTimeout(300);
    const after = await p
      .getByTestId("session-card")
      .evaluateAll((els) =>
        els.map((e) => `${e.getAttribute("data-session-id")}@${e.closest("td")?.getAttribute("data-date")}`),
      );
    expect(after).toEqual(before);
    await screenshot(p, "planner-athlete");
    const api = await apiSession(app, athlete.email!);
    const id = Number(await card.getAttribute("data-session-id"));
    const res = await api.fetch(`/api/sessions/${id}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ version: 1, date: thisWeek }),
    });
    expect(res.status).toBe(403);
    await p.close();
  });
});
