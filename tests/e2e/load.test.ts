// Load screens in a real browser against the built app and the demo seed: the squad table shows the club's
// week, sorts by ACWR, flags the demo's spike next week, and the athlete chart draws; athletes see only their own.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { SPIKE_ATHLETE } from "@/lib/seed/seed-load";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";
import { createAppTeam } from "../helpers/app-team";
import { TEST_PASSWORD } from "../helpers/fixtures";

const headCoach = DEMO_STAFF.find((s) => s.role === "head_coach")!;
const maya = DEMO_ATHLETES.find((a) => a.name === "Maya Okafor")!;

async function ratios(page: Page): Promise<number[]> {
  const cells = page.locator('[data-testid="squad-load-row"] [data-testid="acwr-cell"]');
  return (await cells.evaluateAll((els) => els.map((e) => Number(e.getAttribute("data-ratio"))))) as number[];
}

describeBrowser("load screens", () => {
  let app: App;
  let browser: Browser;
  let page: Page;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, headCoach.email);
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("renders the team's week, one row per athlete, with the caution", async () => {
    // One row per athlete, counted on a team of this test's own (two athletes, no history yet).
    await createAppTeam(app.dbPath, { name: "Load Track" });
    const own = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(own, app, "head@loadtrack.test", TEST_PASSWORD);
    await own.goto(`${app.url}/load`);
    await own.getByTestId("squad-load-table").waitFor();
    const names = await own
      .getByTestId("squad-load-row")
      .evaluateAll((rows) => rows.map((r) => r.getAttribute("data-athlete")));
    expect(names.sort()).toEqual(["Ada Athlete", "Ben Athlete"]);
    await own.close();
    // The demo club's week, with its designed history behind it.
    await page.goto(`${app.url}/load`);
    await page.getByTestId("squad-load-table").waitFor();
    expect(await page.getByTestId("load-caution").count()).toBe(1);
    // Eight weeks of logged history stand behind this week, so every athlete has a ratio.
    expect((await ratios(page)).every((r) => Number.isFinite(r) && r > 0)).toBe(true);
    await screenshot(page, "load-squad");
  });

  it("sorts by ACWR, highest first, then lowest first", async () => {
    await page.getByTestId("sort-ratio").click();
    const desc = await ratios(page);
    expect(desc).toEqual([...desc].sort((a, b) => b - a));
    await page.getByTestId("sort-ratio").click();
    const asc = await ratios(page);
    expect(asc).toEqual([...asc].sort((a, b) => a - b));
    expect(new Set(asc).size).toBeGreaterThan(1);
  });

  it("hides a column and exports the rows as shown to CSV", async () => {
    await page.getByTestId("choose-columns").click();
    await page.getByRole("checkbox", { name: "Group" }).uncheck();
    await page.getByTestId("choose-columns").click();
    expect(await page.getByTestId("sort-group").count()).toBe(0);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("export-csv").click()]);
    const csv = await (
      await download.createReadStream()
    )
      .toArray()
      .then((chunks) => Buffer.concat(chunks).toString("utf8"));
    const lines = csv.trim().split(/\r?\n/);
    // The load caution travels with the figures as the first line (a monitoring aid, not a diagnosis).
    expect(lines.shift()).toContain("Load flags are monitoring aids, not diagnoses");
    expect(lines[0]).toBe(
      "Athlete,ACWR,Flags,HSR m,Near-max m,Sprint steps (est.),Plyo contacts,Contacts by intensity," +
        "≥ HSR speed m,≥ sprint speed m,≥ HSR % m,≥ near-max % m,≥ maximal % m,sRPE (AU),Weekly change",
    );
    expect(lines).toHaveLength((await page.getByTestId("squad-load-row").count()) + 1);
    await page.getByTestId("choose-columns").click();
    await page.getByRole("checkbox", { name: "Group" }).check();
    await page.getByTestId("choose-columns").click();
  });

  it("filters by group and shows the demo's spike in next week's plan", async () => {
    // The spike athlete's group, and how many athletes the seed puts in it.
    const group = DEMO_ATHLETES.find((a) => a.name === SPIKE_ATHLETE)!.group;
    await page.getByTestId("filter-group").selectOption(group);
    const members = DEMO_ATHLETES.filter((a) => a.group === group).length;
    await expect.poll(() => page.getByTestId("squad-load-row").count()).toBe(members);
    await page.getByLabel("Next week").click();
    await page.getByTestId("week-label").getByText(/–/).waitFor();
    const jonah = page.locator(`[data-testid="squad-load-row"][data-athlete="${SPIKE_ATHLETE}"]`);
    await jonah.locator('[data-testid="flag-badge"][data-kind="spike"]').waitFor({ timeout: 15_000 });
    await page.getByTestId("filter-flag").selectOption("spike");
    await expect.poll(() => page.getByTestId("squad-load-row").count()).toBe(1);
    await screenshot(page, "load-squad-next-week");
  });

  it("draws the athlete chart: bars of the chosen metric and the ratio line", async () => {
    await page
      .locator(`[data-testid="squad-load-row"][data-athlete="${SPIKE_ATHLETE}"]`)
      .getByTestId("athlete-link")
      .click();
    await page.waitForURL(/\/load\/\d+$/);
    const chart = page.getByTestId("load-chart");
    await chart.locator("svg .recharts-bar-rectangle").first().waitFor();
    expect(await chart.locator("svg .recharts-bar-rectangle").count()).toBeGreaterThan(20);
    expect(await page.getByTestId("ratio-chart").locator("svg path.recharts-curve").count()).toBeGreaterThan(0);
    await page.getByTestId("metric-select").selectOption("hsrM");
    await page.getByText("HSR metres per day").waitFor();
    expect(await page.getByTestId("load-caution").count()).toBe(1);
    await screenshot(page, "load-athlete");
  });

  it("a flag's link opens its section of the explanation page, with the team's lines and the caution", async () => {
    await page.getByTestId("flag-explain").first().click();
    await page.waitForURL(/\/figures#/);
    await page.getByRole("heading", { name: "How figures are worked out" }).waitFor();
    expect(await page.getByTestId("figures-team-thresholds").textContent()).toContain("ratio at or above 1.50");
    expect(await page.getByTestId("figures-acwr").textContent()).toContain("first day on record");
    expect(await page.getByTestId("load-caution").count()).toBe(1);
    await screenshot(page, "figures");
  });

  it(
    "over real HTTP, the squad table, the week plan and each athlete page give the same daily ratios " +
      "(lib/load/README.md §5)",
    async () => {
      const api = await apiSession(app, headCoach.email);
      type Week = { dailyRatio: (number | null)[] };
      const squad = (await (await api.fetch(`/api/teams/1/load?view=projected`)).json()) as {
        weekStart: string;
        rows: ({ id: number } & Week)[];
      };
      const plan = (await (await api.fetch(`/api/teams/1/plan?week=${squad.weekStart}`)).json()) as {
        athletes: { id: number; load: { week: Week } }[];
      };
      for (const row of squad.rows) {
        const page = (await (await api.fetch(`/api/athletes/${row.id}/load?view=projected&metric=srpe`)).json()) as {
          days: { date: string; ratio: number | null }[];
        };
        const start = page.days.findIndex((x) => x.date === squad.weekStart);
        expect(start).toBeGreaterThanOrEqual(0);
        const fromPage = page.days.slice(start, start + 7).map((x) => x.ratio);
        const fromPlan = plan.athletes.find((a) => a.id === row.id)!.load.week.dailyRatio;
        for (const other of [fromPage, fromPlan]) {
          other.forEach((r, i) => {
            const ref = row.dailyRatio[i];
            expect(r === null).toBe(ref === null);
            if (r !== null && ref !== null) expect(Math.abs(r - ref)).toBeLessThanOrEqual(1e-12);
          });
        }
      }
    },
  );

  it("lets an athlete open only their own load", async () => {
    const mayaPage = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(mayaPage, app, maya.email!);
    await mayaPage.goto(`${app.url}/load`);
    await mayaPage.waitForURL(/\/load\/\d+$/);
    const own = Number(new URL(mayaPage.url()).pathname.split("/").pop());
    await mayaPage.getByTestId("load-chart").locator("svg").first().waitFor();
    const api = await apiSession(app, maya.email!);
    expect((await api.fetch(`/api/athletes/${own}/load`)).status).toBe(200);
    const squad = await (await apiSession(app, headCoach.email)).fetch(`/api/teams/1/load`);
    const jonahId = ((await squad.json()) as { rows: { id: number; name: string }[] }).rows.find(
      (r) => r.name === SPIKE_ATHLETE,
    )!.id;
    expect((await api.fetch(`/api/athletes/${jonahId}/load`)).status).toBe(404);
    expect((await api.fetch(`/api/teams/1/load`)).status).toBe(403);
    // The page streams behind loading.tsx, so the answer is the not-found screen rather than a 404 status.
    await mayaPage.goto(`${app.url}/load/${jonahId}`);
    await mayaPage.getByTestId("not-found").waitFor();
    expect(await mayaPage.getByTestId("load-chart").count()).toBe(0);
    await mayaPage.close();
  });
});
