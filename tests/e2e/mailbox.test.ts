// The local mailbox over real HTTP and in Chromium: an athlete asks for the head coach's password reset
// through the public form, then cannot find that mail through the mailbox API or screen; the head coach can.
// Mail travels app → outbox → the real fake SMTP server; the dev mailbox listens on every interface, so this
// is an account takeover if it leaks.
import { afterAll, beforeAll, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { apiSession, describeBrowser, launchBrowser, screenshot, signIn } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const HEAD = "head.coach@harbourvale.test";
const ATHLETE = "maya@harbourvale.test";
const RESET_SUBJECT = "Reset your Sprintwright password";

describeBrowser("local mailbox: each member reads only their own mail", () => {
  let app: MailApp;
  let browser: Browser;
  let resetId: string;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("the athlete requests the head coach's reset through the forgot-password form", async () => {
    const page = await browser.newPage();
    await page.goto(`${app.url}/forgot-password`);
    await page.getByLabel("E-mail").fill(HEAD);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByTestId("reset-sent").waitFor();
    await page.close();
    const mail = await app.waitForMail(HEAD, (m) => m.subject === RESET_SUBJECT);
    expect(mail.text).toMatch(/\/invite\/[A-Za-z0-9_-]{20,}/);
    resetId = mail.id;
  });

  it(
    "the mailbox API gives the athlete none of it: not in the list, 404 for the mail, raw and parts, " +
      "403 for another address",
    async () => {
      const athlete = await apiSession(app, ATHLETE);
      const list = await athlete.fetch("/api/mailbox");
      expect(list.status).toBe(200);
      const body = (await list.json()) as { mails: Array<{ id: string; subject: string }> };
      expect(body.mails.map((m) => m.id)).not.toContain(resetId);
      expect(JSON.stringify(body)).not.toContain(RESET_SUBJECT);
      for (const path of [
        `/api/mailbox/${resetId}`,
        `/api/mailbox/${resetId}/raw`,
        `/api/mailbox/${resetId}/attachments/0`,
      ]) {
        const res = await athlete.fetch(path);
        expect(res.status, path).toBe(404);
        expect(await res.text(), path).not.toMatch(/\/invite\//);
      }
      expect((await athlete.fetch(`/api/mailbox?to=${encodeURIComponent(HEAD)}`)).status).toBe(403);
      // Another member of staff cannot read it either.
      const coach = await apiSession(app, "coach@harbourvale.test");
      expect((await coach.fetch(`/api/mailbox/${resetId}`)).status).toBe(404);
    },
  );

  it("the mailbox screen shows the athlete neither the mail nor a way to it, and says it exists only locally", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, ATHLETE);
    await page.goto(`${app.url}/mailbox`);
    const note = await page.getByTestId("mailbox-local-note").textContent();
    expect(note).toContain("only while mail stays on this machine");
    expect(note).toContain(ATHLETE);
    expect(await page.getByText(RESET_SUBJECT).count()).toBe(0);
    expect(await page.getByTestId("delivery-queue").count()).toBe(0);
    expect(await page.content()).not.toContain(resetId);
    await screenshot(page, "mailbox-athlete");
    // The page streams behind a loading skeleton, so its status is already sent; the not-found screen replaces it.
    await page.goto(`${app.url}/mailbox/${resetId}`);
    await page.getByTestId("not-found").waitFor();
    expect(await page.getByTestId("mail-text").count()).toBe(0);
    expect(await page.content()).not.toMatch(/\/invite\/[A-Za-z0-9_-]{20,}/);
    await page.close();
  });

  it("the head coach reads the reset mail and sees the team's queue without bodies or links", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, app, HEAD);
    await page.goto(`${app.url}/mailbox`);
    const queue = page.getByTestId("delivery-queue");
    await queue.waitFor();
    const queueText = (await queue.textContent()) ?? "";
    expect(queueText).toContain("Password reset");
    expect(queueText).toContain(HEAD);
    expect(queueText).not.toContain("/invite/");
    await screenshot(page, "mailbox-head-coach");
    await page.getByTestId("mail-row").filter({ hasText: RESET_SUBJECT }).first().click();
    await page.getByTestId("mail-text").waitFor();
    expect(await page.getByTestId("mail-text").textContent()).toMatch(/\/invite\/[A-Za-z0-9_-]{20,}/);
    await page.close();
  });
});
