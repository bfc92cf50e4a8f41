// Printing a week: the week grid and one athlete's week on A4 landscape, every prescription whole, no navigation,
// planner controls or block shelf. Chromium's print media emulation and page.pdf render what paper gets.
import { DateTime } from "luxon";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { startOfWeek } from "@/lib/dates/plain-date";
import { DEMO_ATHLETES } from "@/lib/seed/demo-club";
import type { PlanWeek } from "@/lib/plan/types";
import { openDatabase } from "@/models";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn, startApp, type App } from "./harness";

const COACH = "coach@harbourvale.test";
const ATHLETE = DEMO_ATHLETES.find((a) => a.email)!;
const thisWeek = startOfWeek(DateTime.now().setZone("Europe/London").toISODate()!, 1);
const LONG_NOTE = "Walk back between reps; stop the set at once if the last rep is slower than the first by a tenth";

async function openPlan(page: Page, app: App) {
  await page.goto(`${app.url}/plan?week=${thisWeek}`);
  await page.locator('[data-testid="planner"][data-ready]').waitFor();
}

/** What the printed sheet shows and whether any of its text is cut (clipped box, ellipsis, line clamp). */
async function printedSheet(page: Page) {
  return page.getByTestId("week-print").evaluate((sheet) => {
    const cut = [...sheet.querySelectorAll<HTMLElement>("*")].filter((el) => {
      const s = getComputedStyle(el);
      return (
        el.scrollHeight > el.clientHeight + 1 ||
        el.scrollWidth > el.clientWidth + 1 ||
        s.textOverflow === "ellipsis" ||
        s.webkitLineClamp !== "none"
      );
    });
    return {
      sessions: [...sheet.querySelectorAll<HTMLElement>('[data-testid="print-session"]')].map((s) => ({
        id: Number(s.dataset.sessionId),
        text: s.innerText.replace(/\s+/g, " "),
      })),
      cut: cut.map((el) => `${el.tagName} ${el.innerText.slice(0, 40)}`),
    };
  });
}

describeBrowser("printing a week", () => {
  let app: App;
  let browser: Browser;
  let week: PlanWeek;
  let athleteId: number;

  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    const sequelize = await openDatabase(app.dbPath);
    const [[{ team_id: teamId }]] = (await sequelize.query("SELECT team_id FROM athletes WHERE name = ?", {
      replacements: [ATHLETE.name],
    })) as [{ team_id: number }[], unknown];
    await sequelize.close();
    const coach = await apiSession(app, COACH);
    const first = (await (await coach.fetch(`/api/teams/${teamId}/plan?week=${thisWeek}`)).json()) as PlanWeek;
    athleteId = first.athletes.find((a) => a.name === ATHLETE.name)!.id;
    // A published session with three blocks, a long plyometric list and a long note: nothing of it may be cut.
    const res = await coach.fetch(`/api/teams/${first.teamId}/sessions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        from: "blank",
        athleteId,
        date: first.days[2],
        startTime: "17:30",
        durationMin: 90,
        title: "Acceleration, bounds and a long tempo finish",
        plannedRpe: 7,
        blocks: [
          {
            kind: "acceleration",
            title: "Standing starts",
            running: { sets: 2, reps: 4, distanceM: 30, intensityPct: 95, start: "standing", runInM: 0, restSec: 180 },
            drills: null,
            notes: LONG_NOTE,
          },
          {
            kind: "plyometric",
            title: "Bounds",
            running: null,
            drills: [
              { name: "Alternate-leg bounds over 30 m", sets: 3, reps: 4, contactsPerRep: 10, intensity: "high" },
              { name: "Single-leg hops, both legs", sets: 2, reps: 6, contactsPerRep: 5, intensity: "moderate" },
            ],
            notes: null,
          },
          {
            kind: "tempo",
            title: "Tempo",
            running: { sets: 1, reps: 8, distanceM: 200, intensityPct: 70, start: "standing", runInM: 0, restSec: 60 },
            drills: null,
            notes: null,
          },
        ],
      }),
    });
    expect(res.status, await res.clone().text()).toBeLessThan(300);
    const [made] = ((await res.json()) as { sessions: { id: number; version: number }[] }).sessions;
    const published = await coach.fetch(`/api/sessions/${made.id}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ version: made.version, status: "published" }),
    });
    expect(published.status, await published.clone().text()).toBe(200);
    week = (await (await coach.fetch(`/api/teams/${first.teamId}/plan?week=${thisWeek}`)).json()) as PlanWeek;
    expect(week.athletes.flatMap((a) => a.sessions).some((s) => s.id === made.id)).toBe(true);
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("prints the week grid on A4 landscape with every session and prescription whole, and no navigation or shelf", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, COACH);
    await openPlan(page, app);
    expect(await page.getByTestId("block-shelf").isVisible()).toBe(true);
    await page.emulateMedia({ media: "print" });
    for (const gone of ["block-shelf", "plan-grid", "print-controls"]) {
      expect(await page.getByTestId(gone).isVisible(), gone).toBe(false);
    }
    expect(await page.getByRole("navigation", { name: "Main" }).isVisible()).toBe(false);
    expect(await page.getByTestId("week-print").isVisible()).toBe(true);
    const sheet = await printedSheet(page);
    expect(sheet.cut).toEqual([]);
    const all = week.athletes.flatMap((a) => a.sessions);
    expect(sheet.sessions.map((s) => s.id).sort()).toEqual(all.map((s) => s.id).sort());
    const ours = sheet.sessions.find((s) => s.text.includes("Acceleration, bounds and a long tempo finish"))!;
    // The whole prescription, as the athlete's screens word it (lib/format/block-summary.ts), down to the note.
    for (const part of [
      "Acceleration – Standing starts: 2 sets of 4 × 30 m",
      `Note: ${LONG_NOTE}`,
      "• Alternate-leg bounds over 30 m: 3 × 4 (10 contacts each), high intensity, 120 contacts",
      "• Single-leg hops, both legs: 2 × 6 (5 contacts each), moderate intensity, 60 contacts",
      "Tempo: 8 × 200 m",
    ]) {
      expect(ours.text).toContain(part);
    }
    await screenshot(page, "print-week-grid");
    // The PDF Chromium prints takes the stylesheet's @page: A4 landscape is 297 × 210 mm = 841.89 × 595.28 pt
    // (ISO 216 sizes; 1 pt = 1/72 in).
    const pdf = (await page.pdf({ preferCSSPageSize: true })).toString("latin1");
    const box = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf)!;
    expect(Number(box[1])).toBeCloseTo(841.89, -1);
    expect(Number(box[2])).toBeCloseTo(595.28, -1);
    await page.close();
  }, 120_000);

  it("prints one athlete's week, chosen by the coach, and the athlete's own week", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, COACH);
    await openPlan(page, app);
    await page.getByTestId("print-choice").selectOption(String(athleteId));
    await page.emulateMedia({ media: "print" });
    const heading = await page.getByTestId("week-print").getByRole("heading").textContent();
    expect(heading).toContain(ATHLETE.name);
    const own = week.athletes.find((a) => a.id === athleteId)!.sessions;
    const sheet = await printedSheet(page);
    expect(sheet.cut).toEqual([]);
    expect(sheet.sessions.map((s) => s.id).sort()).toEqual(own.map((s) => s.id).sort());
    await screenshot(page, "print-one-athlete");
    await page.close();

    const mine = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signIn(mine, app, ATHLETE.email!);
    await openPlan(mine, app);
    expect(await mine.getByTestId("print-week").textContent()).toBe("Print my week");
    await mine.emulateMedia({ media: "print" });
    expect(await mine.getByTestId("week-print").getByRole("heading").textContent()).toContain(ATHLETE.name);
    const printed = await printedSheet(mine);
    expect(printed.cut).toEqual([]);
    expect(printed.sessions.map((s) => s.text).join(" ")).toContain("Acceleration – Standing starts");
    await mine.close();
  }, 120_000);
});
