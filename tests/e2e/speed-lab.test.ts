// The speed lab in a real browser against the built app and the demo club: upload a timing CSV, see the fit and
// its chart, accept it, and see the athlete's vmax change and the plan's HSR change for weeks after the test
// only (lib/speed/README.md §4). Phone width, axe-clean.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import type { PlanWeek } from "@/lib/plan/types";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";

const headCoach = DEMO_STAFF.find((s) => s.role === "head_coach")!;
const maya = DEMO_ATHLETES.find((a) => a.name === "Maya Okafor")!;
const jonah = DEMO_ATHLETES.find((a) => a.name === "Jonah Pell")!;

async function noSidewaysScroll(page: Page) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth + 1)).toBe(true);
}

describeBrowser("speed lab", () => {
  let app: App;
  let browser: Browser;
  let page: Page;
  let api: Awaited<ReturnType<typeof apiSession>>;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(page, app, headCoach.email);
    api = await apiSession(app, headCoach.email);
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("upload → fit and chart → accept → vmax and the plan's HSR change from the test date on only", async () => {
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    const thisWeek = startOfWeek(today, 1);
    const lastWeek = addDays(thisWeek, -7);
    const nextWeek = addDays(thisWeek, 7);
    await page.goto(`${app.url}/plan`);
    const teamId = await page.getByTestId("planner").getAttribute("data-team-id");
    const hsrOf = async (week: string) => {
      const plan = (await (await api.fetch(`/api/teams/${teamId}/plan?week=${week}`)).json()) as PlanWeek;
      return plan.athletes.find((a) => a.name === maya.name)!.load.week.totals.hsrM;
    };
    const [lastBefore, nextBefore] = [await hsrOf(lastWeek), await hsrOf(nextWeek)];
    expect(nextBefore).toBeGreaterThan(0);
    // The same figures on the week plan's screen (a desktop-width planner: Maya's row total).
    const wide = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(wide, app, headCoach.email);
    const mayaRow = (
      (await (await api.fetch(`/api/teams/${teamId}/plan?week=${thisWeek}`)).json()) as PlanWeek
    ).athletes.find((a) => a.name === maya.name)!.id;
    const onScreen = async (week: string) => {
      await wide.goto(`${app.url}/plan?week=${week}`);
      const total = wide.locator(`[data-testid="athlete-row"][data-athlete-id="${mayaRow}"] [data-testid="total-hsr"]`);
      return Number(await total.first().getAttribute("data-value"));
    };
    expect([await onScreen(lastWeek), await onScreen(nextWeek)]).toEqual([
      Math.round(lastBefore),
      Math.round(nextBefore),
    ]);

    await page.goto(`${app.url}/speed`);
    await page.getByTestId("retest-due").waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);

    // The re-test interval: a bad value is named on the form, a good one is saved and the card follows it.
    const weeks = page.locator("#retestWeeks");
    await weeks.fill("60");
    await page.getByTestId("save-retest-weeks").click();
    await page.getByRole("alert").filter({ hasText: "At most 52 weeks" }).waitFor();
    await weeks.fill("8");
    await page.getByTestId("save-retest-weeks").click();
    await page.getByText("Saved: due after 8 weeks.").waitFor();
    await page.getByTestId("retest-due").getByText("No timing test in the last 8 weeks.").waitFor();

    // A file with a problem: the row is named and nothing is saved.
    const header = "athlete,date,trial,start,distance_m,time_s,body_mass_kg";
    await page.setInputFiles("#timing-file", {
      name: "bad.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(`${header}\nNobody,${thisWeek},1,standing,10,1.9,\n`),
    });
    await page.getByTestId("upload-problems").waitFor();
    expect(await page.getByTestId("upload-problems").innerText()).toContain(
      'Line 2 (athlete): Unknown athlete "Nobody"',
    );

    // T4 splits (lib/speed/README.md §1): vmax 9.5 m/s, τ 1.1 s, dated the first day of this week.
    const rows = ["0,0", "10,1.969", "20,3.142", "30,4.2345", "40,5.3017"].map(
      (g) => `${maya.name},${thisWeek},1,standing,${g},`,
    );
    await page.setInputFiles("#timing-file", {
      name: "gates.csv",
      mimeType: "text/csv",
      buffer: Buffer.from([header, ...rows].join("\n")),
    });
    await page.getByTestId("upload-message").filter({ hasText: "Saved 1 trial" }).waitFor();
    await page.getByRole("link", { name: `${maya.name} · ${thisWeek}` }).click();
    await page.getByTestId("speed-profile").waitFor();
    const fit = page.locator('[data-testid^="fit-"]').first();
    expect(await fit.innerText()).toContain("vmax 9.50 m/s");
    expect(await fit.innerText()).toContain("τ 1.10 s");
    // lib/speed/README.md §3, no-drag form: V0 = vmax.
    expect(await fit.innerText()).toMatch(/F0 \d+ N · V0 9\.50 m\/s · Pmax \d+ W \(no air drag\)/);
    await page.getByTestId("fit-chart").locator("svg").first().waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);
    await screenshot(page, "speed-profile-before");

    await page.locator('[data-testid^="accept-"]').first().click();
    await page.getByText(`In use from ${thisWeek}`).waitFor();
    expect(await page.getByTestId("current-vmaxMs").innerText()).toBe("9.50 m/s");
    expect(await page.getByTestId("profile-history").innerText()).toContain(`accepted by ${headCoach.name}`);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "speed-profile-accepted");

    // The plan: last week's HSR as it was; next week's follows the new vmax.
    expect(await hsrOf(lastWeek)).toBe(lastBefore);
    expect(await hsrOf(nextWeek)).not.toBe(nextBefore);
    expect(await onScreen(lastWeek)).toBe(Math.round(lastBefore));
    // The screen shows the new figure (whole metres: the change can be under one).
    expect(await onScreen(nextWeek)).toBe(Math.round(await hsrOf(nextWeek)));
    await wide.close();
  }, 240_000);

  it("a speed trace of a planned session shows measured next to planned; a 2 Hz trace is refused; contact rows", async () => {
    await page.goto(`${app.url}/speed`);
    await page.getByRole("link", { name: maya.name }).first().click();
    await page.getByTestId("measure-upload").waitFor();
    // The sprint model of lib/speed/README.md T4 (vmax 9.5 m/s, τ 1.1 s) after 1 s standing, at `hz`.
    const trace = (hz: number) =>
      [
        "time_s,speed_ms",
        ...Array.from({ length: 10 * hz + 1 }, (_, i) => {
          const t = i / hz;
          return `${t.toFixed(3)},${(t < 1 ? 0 : 9.5 * (1 - Math.exp(-(t - 1) / 1.1))).toFixed(3)}`;
        }),
      ].join("\n");
    const choices = page.locator("#measure-session option");
    expect(await choices.count()).toBeGreaterThan(1);
    const sessionId = await choices.nth(1).getAttribute("value");
    const mayaId = new URL(page.url()).pathname.split("/").at(-1)!;
    await page.locator("#measure-session").selectOption({ index: 1 });
    await page.setInputFiles("#measure-file", {
      name: "slow.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(trace(2)),
    });
    await page.getByTestId("measure-send").click();
    await page
      .getByTestId("measure-message")
      .filter({ hasText: "The speed trace is sampled at 2.0 Hz; at least 10 Hz is needed. Nothing was saved." })
      .waitFor();
    expect(await page.locator('[data-testid^="trace-summary-"]').count()).toBe(0);

    await page.setInputFiles("#measure-file", {
      name: "radar.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(trace(20)),
    });
    await page.getByTestId("measure-send").click();
    await page.getByTestId("measure-message").filter({ hasText: "Saved radar.csv." }).waitFor();
    const summary = page.locator('[data-testid^="trace-summary-"]').first();
    await summary.waitFor();
    expect(await summary.innerText()).toMatch(/τ 1\.10 s/);
    const table = page.locator('[data-testid^="plan-measured-"]').first();
    expect(await table.innerText()).toContain("planned against measured");
    expect(await table.innerText()).toContain("HSR metres");
    await page.getByTestId("trace-chart").locator("svg").first().waitFor();
    const onSpeedPage = await table.innerText();

    // The same planned-against-measured figures where the coach reads the session's load: the athlete's load
    // page and the planner's session dialog (one reader, lib/data/measured-load.ts).
    await page.goto(`${app.url}/load/${mayaId}`);
    const listed = page.getByTestId("plan-measured-list").locator('[data-testid^="plan-measured-"]').first();
    await listed.waitFor();
    expect(await listed.innerText()).toBe(onSpeedPage);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);
    const wide = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    try {
      await signIn(wide, app, headCoach.email);
      const sessionDate = / on (\d{4}-\d{2}-\d{2}): planned against measured/.exec(onSpeedPage)![1];
      await wide.goto(`${app.url}/plan?week=${sessionDate}`);
      await wide.locator(`[data-testid="session-card"][data-session-id="${sessionId}"] button`).first().click();
      const dialog = wide.getByTestId("session-measured");
      await dialog.waitFor();
      const rowsOf = (text: string) => text.split("\n").slice(1).join("\n");
      expect(rowsOf(await dialog.locator("table").innerText())).toBe(rowsOf(onSpeedPage));
      expect(await seriousAxeViolations(wide)).toEqual([]);
    } finally {
      await wide.close();
    }
    await page.goto(`${app.url}/speed/${mayaId}`);
    await page.getByTestId("measure-upload").waitFor();

    await page.locator("#measure-kind").selectOption("contacts");
    // Not the timing test's day (one profile entry a day): today, or yesterday when today starts the week.
    const today = teamToday({ timeZone: "Europe/London", now: new Date() });
    await page.locator("#measure-date").fill(today === startOfWeek(today, 1) ? addDays(today, -1) : today);
    const mat = "contact_time_s,flight_time_s,step_length_m\n0.086,0.145,2.3\n0.086,0.145,2.3\n";
    await page.setInputFiles("#measure-file", { name: "mat.csv", mimeType: "text/csv", buffer: Buffer.from(mat) });
    await page.getByTestId("measure-send").click();
    const means = page.locator('[data-testid^="contacts-means-"]').first();
    await means.waitFor();
    // lib/speed/README.md B1/B2: 4.329 Hz and 2.686 BW.
    expect(await means.innerText()).toContain("4.33 Hz");
    expect(await means.innerText()).toContain("2.69 × BW");
    // Accepted, the contact rows become the profile's step frequency and stance force from their date on.
    await page.locator('[data-testid^="contacts-"] [data-testid^="accept-"]').first().click();
    await page.getByTestId("current-stepFrequencyHz").filter({ hasText: "4.33 Hz" }).waitFor();
    expect(await page.getByTestId("current-stanceForceBw").innerText()).toBe("2.69 × BW");
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);
    await screenshot(page, "speed-traces-and-contacts");
  }, 240_000);

  it("typed in: a timing trial and contact rows, each problem on its field, saved and fitted like an upload", async () => {
    await page.goto(`${app.url}/speed`);
    const form = page.getByTestId("typed-timing");
    await form.waitFor();
    // Nothing chosen or typed yet: the athlete and each gate's time are named on their fields.
    await page.getByTestId("typed-timing-save").click();
    await form.getByRole("alert").filter({ hasText: "Choose the athlete" }).waitFor();
    expect(await form.getByRole("alert").filter({ hasText: "Time must be a number" }).count()).toBe(4);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);

    // T4 splits (lib/speed/README.md §1), first with the 30 m time before the 20 m one.
    await page.locator("#typed-athlete").selectOption({ label: jonah.name });
    const times = ["1.969", "3.142", "3.0", "5.3017"];
    for (const [i, t] of times.entries()) await page.locator(`#typed-gate-${i}-s`).fill(t);
    await page.getByTestId("typed-timing-save").click();
    await form.getByRole("alert").filter({ hasText: "Times go backwards: 30 m (3 s)" }).waitFor();
    expect(await page.locator("#typed-gate-2-s").getAttribute("aria-invalid")).toBe("true");
    await page.locator("#typed-gate-2-s").fill("4.2345");
    await page.getByTestId("typed-timing-save").click();
    await page
      .getByTestId("typed-timing-message")
      .filter({ hasText: `Saved the trial of ${jonah.name}` })
      .waitFor();
    await page.getByTestId("typed-timing-message").getByRole("link", { name: "See the fit" }).click();
    await page.getByTestId("speed-profile").waitFor();
    const fit = page.locator('[data-testid^="fit-"]').first();
    expect(await fit.innerText()).toContain("vmax 9.50 m/s");
    expect(await fit.innerText()).toContain("τ 1.10 s");
    await page.getByTestId("no-drag-note").waitFor();
    await page.locator('[data-testid^="test-"] button[data-testid^="accept-"]').first().click();
    await page.getByTestId("current-vmaxMs").filter({ hasText: "9.50 m/s" }).waitFor();

    // Contact rows: a contact shorter than the file's bound is named on its field; B1 rows give 4.33 Hz, 2.69 BW.
    const contacts = page.getByTestId("typed-contacts");
    await page.locator("#typed-c-0-contact").fill("0.01");
    await page.locator("#typed-c-0-flight").fill("0.145");
    await page.locator("#typed-c-1-contact").fill("0.086");
    await page.locator("#typed-c-1-flight").fill("0.145");
    await page.getByTestId("typed-contacts-save").click();
    await contacts.getByRole("alert").filter({ hasText: "Contact time must be at least 0.02 s" }).waitFor();
    await page.locator("#typed-c-0-contact").fill("0.086");
    await page.locator("#typed-c-0-step").fill("2.3");
    await page.getByTestId("typed-contacts-save").click();
    await page.getByTestId("typed-contacts-message").filter({ hasText: "Saved 2 contacts" }).waitFor();
    const means = page.locator('[data-testid^="contacts-means-"]').first();
    await means.waitFor();
    expect(await means.innerText()).toContain("4.33 Hz");
    expect(await means.innerText()).toContain("2.69 × BW");

    // The same day already has the timing result: the coach is told, and may use the contacts as well.
    await page.locator('[data-testid^="contacts-"] button[data-testid^="accept-"]').first().click();
    const refused = page.locator('[data-testid^="accept-error-"]').first();
    await refused.filter({ hasText: "Another result is already in use from" }).waitFor();
    expect(await refused.innerText()).toContain(`accepted by ${headCoach.name}`);
    await page.locator('button[data-testid^="replace-"]').first().click();
    await page.getByTestId("current-stepFrequencyHz").filter({ hasText: "4.33 Hz" }).waitFor();
    expect(await page.getByTestId("current-vmaxMs").innerText()).toBe("9.50 m/s");
    expect(await page.getByTestId("profile-replaced").innerText()).toMatch(
      new RegExp(`^Replaced: vmax 9\\.50 m/s · τ 1\\.10 s,\\s+accepted by ${headCoach.name}`),
    );
    expect(await seriousAxeViolations(page)).toEqual([]);
    await noSidewaysScroll(page);
    await screenshot(page, "speed-typed-in");
  }, 240_000);
});
