// Every main screen, for every role: no sideways scroll at 390 × 844, a phone menu that shows every item and
// works by keyboard, axe-core with no serious or critical violation, and the squad-load CSV carrying the caution.
// The week plan's own layout and axe check belong to the planner's tests; here it is only measured for width.
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import type { Role } from "@/lib/auth/roles";
import { LOAD_CAUTION } from "@/lib/load/flag-display";
import { navFor } from "@/lib/nav";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { seriousAxeViolations } from "./axe";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 800 };
const ATHLETE = DEMO_ATHLETES.find((a) => a.email)!;
const PEOPLE: { role: Role; email: string }[] = [
  ...DEMO_STAFF.map((s) => ({ role: s.role as Role, email: s.email })),
  { role: "athlete", email: ATHLETE.email! },
];

/** The elements that stick out past the viewport's right edge, deepest first, to name in a failure. */
async function overflow(page: Page): Promise<{ scrollWidth: number; width: number; culprits: string[] }> {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const culprits = [...document.querySelectorAll<HTMLElement>("body *")]
      .filter((el) => el.getBoundingClientRect().right > width + 0.5 && el.getClientRects().length > 0)
      .filter((el) => ![...el.children].some((c) => c.getBoundingClientRect().right > width + 0.5))
      .slice(0, 6)
      .map(
        (el) =>
          `${el.tagName.toLowerCase()}.${el.className.toString().slice(0, 60)} → ${el.getBoundingClientRect().right}px`,
      );
    return { scrollWidth: document.documentElement.scrollWidth, width, culprits };
  });
}

/** A line naming the page and what sticks out when it scrolls sideways, else null. */
async function sideways(page: Page, where: string): Promise<string | null> {
  const o = await overflow(page);
  return o.scrollWidth <= o.width
    ? null
    : `${where} is ${o.scrollWidth}px wide at ${o.width}px: ${o.culprits.join("; ")}`;
}

async function visit(page: Page, url: string) {
  await page.goto(url, { waitUntil: "networkidle" });
}

describeBrowser("every main screen", () => {
  let app: MailApp;
  let browser: Browser;
  let athleteId: number;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    [{ id: athleteId }] = await app.query<{ id: number }>("SELECT id FROM athletes WHERE name = ?", [ATHLETE.name]);
    const [{ team_id: teamId }] = await app.query<{ team_id: number }>("SELECT team_id FROM athletes WHERE id = ?", [
      athleteId,
    ]);
    // A spike next week, so the alerts screen and the mailboxes have a card and a mail to lay out.
    const coach = await apiSession(app, "coach@harbourvale.test");
    const nextWeek = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
    for (const day of [1, 2]) {
      const res = await coach.fetch(`/api/teams/${teamId}/sessions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          from: "blank",
          athleteId,
          date: addDays(nextWeek, day),
          startTime: "09:00",
          durationMin: 300,
          title: "Overload camp with a long title that wraps on a phone",
          plannedRpe: 10,
          blocks: [],
        }),
      });
      expect(res.status, await res.clone().text()).toBeLessThan(300);
    }
    await app.waitForMail("physio@harbourvale.test", (m) => m.subject.startsWith("Load flag:"));
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  /** Every page a role reaches from the navigation, plus the athlete pages behind the squad screens. */
  function pagesOf(role: Role): string[] {
    const hrefs = new Set(navFor(role).map((n) => n.href));
    hrefs.add("/mailbox");
    if (role !== "athlete") {
      hrefs.add(`/load/${athleteId}`);
      hrefs.add(`/squad/${athleteId}`);
    }
    return [...hrefs];
  }

  it("no page scrolls sideways at 390 × 844, signed out or signed in as any role", async () => {
    // Every page is measured before the verdict, so one run names every page that is too wide.
    const wide: string[] = [];
    const expectNoSideways = async (page: Page, where: string) => {
      const line = await sideways(page, where);
      if (line) wide.push(line);
    };
    const page = await browser.newPage({ viewport: PHONE });
    for (const path of ["/", "/sign-in", "/forgot-password"]) {
      await visit(page, `${app.url}${path}`);
      await expectNoSideways(page, path);
    }
    await page.close();
    for (const { role, email } of PEOPLE) {
      const context = await browser.newContext({ viewport: PHONE });
      const page = await context.newPage();
      await signIn(page, app, email);
      for (const path of pagesOf(role)) {
        await visit(page, `${app.url}${path}`);
        await expectNoSideways(page, `${path} (${role})`);
        if (path === "/load" && role !== "athlete") {
          // The column list opens over the toolbar.
          await page.getByTestId("choose-columns").click();
          await expectNoSideways(page, "/load column list");
          await screenshot(page, "phone-load-columns");
        }
      }
      const [mail] = await page.locator('a[href^="/mailbox/"]').all();
      if (mail) {
        await mail.click();
        await page.waitForURL(/\/mailbox\/.+/);
        await expectNoSideways(page, `a mail (${role})`);
      }
      await context.close();
    }
    expect(wide).toEqual([]);
  }, 300_000);

  it("on a phone the menu shows every item of the role, by keyboard, and closes on Escape and on a link", async () => {
    for (const { role, email } of PEOPLE) {
      const context = await browser.newContext({ viewport: PHONE });
      const page = await context.newPage();
      await signIn(page, app, email);
      await visit(page, `${app.url}/home`);
      const nav = page.getByRole("navigation", { name: "Main" });
      const menu = nav.getByRole("button", { name: /^Menu/ });
      // Nothing of the navigation is cut off: the only thing on the bar is the menu button.
      expect(await nav.getByRole("link").count()).toBe(0);
      await menu.focus();
      await page.keyboard.press("Enter");
      const sheet = page.getByRole("dialog", { name: "Menu" });
      await sheet.waitFor();
      const labels = (await sheet.getByRole("link").allTextContents()).map((t) => t.replace(/\d+$/, ""));
      expect(labels).toEqual([...new Set(navFor(role).map((n) => n.label)), "Mailbox"]);
      for (const link of await sheet.getByRole("link").all()) expect(await link.isVisible()).toBe(true);
      // Focus stays inside the sheet (a modal dialog); Escape closes it and gives focus back to the button.
      for (let i = 0; i < labels.length + 3; i++) {
        await page.keyboard.press("Tab");
        expect(await sheet.evaluate((d) => d.contains(document.activeElement))).toBe(true);
      }
      if (role === "athlete") await screenshot(page, "phone-menu-athlete");
      await page.keyboard.press("Escape");
      await sheet.waitFor({ state: "hidden" });
      expect(await menu.evaluate((b) => b === document.activeElement)).toBe(true);
      // A link followed closes the sheet on the new page.
      await menu.click();
      await sheet.getByRole("link", { name: "How figures work" }).click();
      await page.waitForURL(/\/figures/);
      await sheet.waitFor({ state: "hidden" });
      expect(await page.getByRole("link", { name: "How figures work" }).count()).toBe(0);
      await context.close();
    }
  }, 240_000);

  it("axe finds no serious or critical violation on the main screens (week plan excepted), desktop and phone", async () => {
    const screens: { who: string | null; path: string }[] = [
      { who: null, path: "/sign-in" },
      { who: "coach@harbourvale.test", path: "/home" },
      { who: "coach@harbourvale.test", path: "/load" },
      { who: "coach@harbourvale.test", path: `/load/${athleteId}` },
      { who: "physio@harbourvale.test", path: "/alerts" },
      { who: "physio@harbourvale.test", path: "/home" },
      { who: "head.coach@harbourvale.test", path: "/squad" },
      { who: "head.coach@harbourvale.test", path: "/members" },
      { who: ATHLETE.email!, path: "/home" },
      { who: ATHLETE.email!, path: "/me" },
      { who: ATHLETE.email!, path: "/load" },
    ];
    const found: Record<string, unknown> = {};
    for (const viewport of [DESKTOP, PHONE]) {
      const pages = new Map<string | null, Page>();
      for (const s of screens) {
        let page = pages.get(s.who);
        if (!page) {
          page = await (await browser.newContext({ viewport })).newPage();
          if (s.who) await signIn(page, app, s.who);
          pages.set(s.who, page);
        }
        await visit(page, `${app.url}${s.path}`);
        const v = await seriousAxeViolations(page);
        if (v.length) found[`${s.path} (${s.who ?? "signed out"}, ${viewport.width}px)`] = v;
      }
      for (const page of pages.values()) await page.context().close();
    }
    expect(found).toEqual({});
  }, 300_000);

  it("the squad-load CSV starts with the load caution", async () => {
    const context = await browser.newContext({ viewport: DESKTOP, acceptDownloads: true });
    const page = await context.newPage();
    await signIn(page, app, "coach@harbourvale.test");
    await visit(page, `${app.url}/load`);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("export-csv").click()]);
    const text = readFileSync((await download.path())!, "utf8");
    const [first, header] = text.split("\r\n");
    // One quoted cell (RFC 4180 §2: fields with commas are enclosed in double quotes), then the column headers.
    expect(first).toBe(`"${LOAD_CAUTION}"`);
    expect(header).toMatch(/Athlete/);
    await context.close();
  }, 120_000);
});
