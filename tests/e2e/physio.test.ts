// Physio journey: a coach's plan change raises a spike; the physio sees it in the alert inbox (with the
// unread badge) and reads its e-mail in the mailbox screen. Mail travels app → outbox → real SMTP (fake).
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const PHYSIO = "physio@harbourvale.test";

describeBrowser("physio journey", () => {
  let app: MailApp;
  let browser: Browser;
  let athlete: { id: number; name: string; team_id: number };

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    [athlete] = await app.query<{ id: number; name: string; team_id: number }>(
      "SELECT id, name, team_id FROM athletes WHERE name = ?",
      ["Maya Okafor"],
    );
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("a coach's plan change raises a spike alert and e-mails the physio once", async () => {
    const coach = await apiSession(app, "coach@harbourvale.test");
    const nextWeek = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
    // What the week grid sends when the coach adds a session: two very long, very hard days next week.
    for (const day of [1, 2]) {
      const res = await coach.fetch(`/api/teams/${athlete.team_id}/sessions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          from: "blank",
          athleteId: athlete.id,
          date: addDays(nextWeek, day),
          startTime: "09:00",
          durationMin: 300,
          title: "Overload camp",
          plannedRpe: 10,
          blocks: [],
        }),
      });
      expect(res.status, await res.clone().text()).toBeLessThan(300);
    }
    const mail = await app.waitForMail(PHYSIO, (m) => m.subject === `Load flag: ${athlete.name} · Spike`);
    expect(mail.text).toContain(`/load/${athlete.id}`);
    expect(mail.text).toContain("monitoring aids, not diagnoses");
    // The same spike again (another edit in the week) must not mail again.
    const res = await coach.fetch(`/api/teams/${athlete.team_id}/sessions`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        from: "blank",
        athleteId: athlete.id,
        date: addDays(nextWeek, 4),
        startTime: "07:00",
        durationMin: 20,
        title: "Walk",
        plannedRpe: 1,
        blocks: [],
      }),
    });
    expect(res.status).toBeLessThan(300);
    await new Promise((r) => setTimeout(r, 1500));
    const [{ n }] = await app.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM outbox_messages WHERE to_email = ? AND subject = ?",
      [PHYSIO, `Load flag: ${athlete.name} · Spike`],
    );
    expect(n).toBe(1);
  });

  it("the physio sees the alert in the inbox and its e-mail in the mailbox screen", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, PHYSIO);
    await page.goto(`${app.url}/home`);
    await page.getByTestId("alerts-unread").waitFor();
    expect(Number(await page.getByTestId("alerts-unread").textContent())).toBeGreaterThanOrEqual(1);

    const nav = page.getByRole("navigation", { name: "Main" });
    await nav.getByRole("link", { name: /^Alerts/ }).click();
    await page.waitForURL(/\/alerts$/);
    const card = page.getByTestId("alert-card").filter({ hasText: athlete.name }).filter({ hasText: "Spike" });
    await card.first().waitFor();
    expect(await card.first().getByTestId("alert-new").count()).toBe(1);
    await page.getByTestId("load-caution").waitFor();
    await screenshot(page, "physio-alerts");

    // Acknowledge with a note; the card keeps the note.
    await card.first().getByRole("button", { name: "Acknowledge" }).click();
    await card.first().getByLabel("Note (optional)").fill("Will check with Maya before Tuesday.");
    await card.first().getByTestId("alert-acknowledge-form").getByRole("button", { name: "Acknowledge" }).click();
    await card.first().getByTestId("alert-note").waitFor();
    expect(await card.first().getAttribute("data-status")).toBe("acknowledged");

    await nav.getByRole("link", { name: "Mailbox" }).click();
    await page.waitForURL(/\/mailbox$/);
    const row = page.getByTestId("mail-row").filter({ hasText: `Load flag: ${athlete.name} · Spike` });
    await row.first().waitFor();
    await screenshot(page, "physio-mailbox");
    await row.first().click();
    await page.getByTestId("mail-text").waitFor();
    expect(await page.getByTestId("mail-to").textContent()).toContain(PHYSIO);
    expect(await page.getByTestId("mail-text").textContent()).toContain(`/load/${athlete.id}`);
    const html = page.frameLocator('[data-testid="mail-html"]');
    await html.getByText("Open the load page").first().waitFor();
    await page.waitForTimeout(300);
    await screenshot(page, "physio-mail");
    await page.getByTestId("mail-html").screenshot({ path: "tests/e2e/artifacts/physio-mail-html.png" });
    await page.close();
  });

  it("the notices API checks who is asking and names the wrong field", async () => {
    const athleteApi = await apiSession(app, "maya@harbourvale.test");
    const physioApi = await apiSession(app, PHYSIO);
    expect((await athleteApi.fetch("/api/alerts")).status).toBe(403);
    expect((await athleteApi.fetch("/api/me/notification-settings")).status).toBe(403);
    expect((await fetch(`${app.url}/api/alerts`)).status).toBe(401);
    expect((await fetch(`${app.url}/api/mailbox`)).status).toBe(401);

    const list = (await (await physioApi.fetch("/api/alerts?status=all")).json()) as { alerts: Array<{ id: number }> };
    const id = list.alerts[0]!.id;
    const noNote = await physioApi.fetch(`/api/alerts/${id}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ action: "resolve", note: "  " }),
    });
    expect(noNote.status).toBe(400);
    expect(((await noNote.json()) as { error: { fields: Record<string, string[]> } }).error.fields.note).toBeDefined();
    expect((await physioApi.fetch("/api/alerts?status=later")).status).toBe(400);
    expect(
      (
        await physioApi.fetch("/api/alerts/999999", {
          method: "PATCH",
          headers: { "content-type": "application/json" },
          body: JSON.stringify({ action: "acknowledge" }),
        })
      ).status,
    ).toBe(404);
    const setting = await physioApi.fetch("/api/me/notification-settings", {
      method: "PUT",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ alertEmail: "weekly" }),
    });
    expect(setting.status).toBe(400);

    // Calendar links: the athlete manages only their own; a physio manages none; a coach any in the team.
    const [jonah] = await app.query<{ id: number }>("SELECT id FROM athletes WHERE name = ?", ["Jonah Pell"]);
    expect((await athleteApi.fetch(`/api/athletes/${jonah!.id}/calendar-token`)).status).toBe(404);
    expect((await athleteApi.fetch(`/api/athletes/${athlete.id}/calendar-token`)).status).toBe(200);
    expect((await physioApi.fetch(`/api/athletes/${athlete.id}/calendar-token`, { method: "POST" })).status).toBe(403);
    const coachApi = await apiSession(app, "coach@harbourvale.test");
    const rotated = await coachApi.fetch(`/api/athletes/${jonah!.id}/calendar-token`, { method: "POST" });
    expect(rotated.status).toBe(201);
    const { url } = (await rotated.json()) as { url: string };
    expect((await fetch(url)).status).toBe(200);
  });
});
