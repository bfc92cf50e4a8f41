// Security headers and request defences against the production build (next start), in Chromium: every main
// screen renders under the Content-Security-Policy with zero violations (CSP Level 3, W3C: the
// "securitypolicyviolation" event), and the HTTP answers carry the headers OWASP ASVS 4.0 §14.4 asks for.
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { actionRefs } from "./authz-call";
import { describeBrowser, launchBrowser, signIn, apiSession } from "./harness";
import { startMailApp, type MailApp } from "./notices-app";

const HEAD = "head.coach@harbourvale.test";
const MAYA = "maya@harbourvale.test";

type Violation = { directive: string; blocked: string; source: string };

async function watch(context: BrowserContext): Promise<{ violations: Violation[]; console: string[] }> {
  const seen = { violations: [] as Violation[], console: [] as string[] };
  await context.exposeBinding("__cspViolation", (_src, v: Violation) => void seen.violations.push(v));
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      window.__cspViolation({
        directive: e.violatedDirective,
        blocked: e.blockedURI,
        source: `${location.pathname} ${e.sourceFile}:${e.lineNumber}`,
      });
    });
  });
  context.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) seen.console.push(m.text());
  });
  return seen;
}

async function visit(page: Page, url: string) {
  const res = await page.goto(url, { waitUntil: "networkidle" });
  expect(res?.status(), url).toBeLessThan(400);
  // Hydration ran: a nonce-less or blocked script would leave the page without React.
  await page.waitForFunction(() => document.querySelector("body") !== null && window.next !== undefined, null, {
    timeout: 10_000,
  });
  await page.waitForTimeout(300);
}

describeBrowser("security headers", () => {
  let app: MailApp;
  let browser: Browser;
  let teamId = 0;
  let athleteId = 0;

  beforeAll(async () => {
    app = await startMailApp();
    browser = await launchBrowser();
    const [maya] = await app.query<{ id: number; team_id: number }>(
      "SELECT a.id, a.team_id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
      [MAYA],
    );
    teamId = maya!.team_id;
    athleteId = maya!.id;
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("every main screen renders with zero CSP violations (head coach, then an athlete)", async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const seen = await watch(context);
    const page = await context.newPage();
    await visit(page, `${app.url}/sign-in`);
    await signIn(page, app, HEAD);
    for (const path of [
      "/home",
      "/plan",
      "/load",
      `/load/${athleteId}`,
      "/alerts",
      "/squad",
      "/members",
      "/mailbox",
      "/settings",
    ])
      await visit(page, `${app.url}${path}`);
    // A same-origin write from the page passes the Origin check.
    const status = await page.evaluate(
      async (t) =>
        (
          await fetch(`/api/teams/${t}/templates`, {
            method: "POST",
            headers: { "content-type": "application/json" },
            body: JSON.stringify({
              kind: "recovery",
              title: "Strides",
              running: null,
              drills: null,
              notes: null,
              durationMin: 20,
              plannedRpe: 3,
            }),
          })
        ).status,
      teamId,
    );
    expect(status).toBe(201);
    await context.close();

    const athlete = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const seenAthlete = await watch(athlete);
    const phone = await athlete.newPage();
    await signIn(phone, app, MAYA);
    for (const path of ["/home", "/me", `/load/${athleteId}`, "/plan", "/mailbox"])
      await visit(phone, `${app.url}${path}`);
    await athlete.close();

    expect([...seen.violations, ...seenAthlete.violations]).toEqual([]);
    expect([...seen.console, ...seenAthlete.console]).toEqual([]);
  }, 120_000);

  it("pages carry a fresh nonce per answer, frame-ancestors 'none' and the other headers; no HSTS over plain HTTP", async () => {
    const a = await fetch(`${app.url}/sign-in`);
    const b = await fetch(`${app.url}/sign-in`);
    const csp = a.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{24}' 'strict-dynamic'(;|$)/);
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(b.headers.get("content-security-policy")).not.toBe(csp);
    // The nonce in the policy is the one on the page's scripts.
    const nonce = /'nonce-([^']+)'/.exec(csp)![1];
    expect(await a.text()).toContain(`nonce="${nonce}"`);
    for (const res of [a, await fetch(`${app.url}/api/health`), await fetch(`${app.url}/`)]) {
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBe("same-origin");
      expect(res.headers.get("permissions-policy")).toContain("camera=()");
      expect(res.headers.get("x-frame-options")).toBe("DENY");
      expect(res.headers.get("strict-transport-security")).toBeNull();
    }
    expect((await fetch(`${app.url}/api/health`)).headers.get("content-security-policy")).toBe(
      "default-src 'none'; frame-ancestors 'none'",
    );
    // Behind a TLS proxy (X-Forwarded-Proto: https) the answers ask browsers to stay on HTTPS.
    const tls = await fetch(`${app.url}/sign-in`, { headers: { "x-forwarded-proto": "https" } });
    expect(tls.headers.get("strict-transport-security")).toBe("max-age=31536000; includeSubDomains");
  });

  it("authenticated JSON is no-store; bodies over 1 MB get 413 without being read; cross-site writes get 403", async () => {
    const coach = await apiSession(app, "coach@harbourvale.test");
    const plan = await coach.fetch(`/api/teams/${teamId}/plan`);
    expect(plan.status).toBe(200);
    expect(plan.headers.get("cache-control")).toBe("no-store");

    // 300 MB offered as a stream: the server answers 413 after about 1 MB instead of reading it all.
    let sent = 0;
    const chunk = new Uint8Array(1024 * 1024).fill(0x20);
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent >= 300 * 1024 * 1024) return controller.close();
        sent += chunk.byteLength;
        controller.enqueue(chunk);
      },
    });
    const started = Date.now();
    const big = await coach
      .fetch(`/api/teams/${teamId}/templates`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body,
        duplex: "half",
      } as RequestInit)
      .then(
        (r) => r.status,
        (e: Error) => `connection closed: ${e.message}`,
      );
    expect([413, "connection closed: fetch failed"]).toContain(big);
    expect(sent).toBeLessThan(100 * 1024 * 1024);
    expect(Date.now() - started).toBeLessThan(20_000);
    const declared = await coach.fetch(`/api/teams/${teamId}/templates`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: " ".repeat(2 * 1024 * 1024),
    });
    expect(declared.status).toBe(413);
    expect((await fetch(`${app.url}/api/health`)).status).toBe(200);

    const template = JSON.stringify({
      kind: "recovery",
      title: "Strides",
      running: null,
      drills: null,
      notes: null,
      durationMin: 20,
      plannedRpe: 3,
    });
    const evil = await coach.fetch(`/api/teams/${teamId}/templates`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "https://evil.test" },
      body: template,
    });
    expect(evil.status).toBe(403);
    const own = await coach.fetch(`/api/teams/${teamId}/templates`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: app.url },
      body: template,
    });
    expect(own.status).toBe(201);
  }, 60_000);

  it("a server action refuses a body over its 200 kB limit (next.config serverActions.bodySizeLimit)", async () => {
    const coach = await apiSession(app, "coach@harbourvale.test");
    const [key, ref] = [...actionRefs()].find(([k]) => k.startsWith("ACTION /squad#"))!;
    const send = (size: number) =>
      coach.fetch(ref.path, {
        method: "POST",
        headers: {
          "next-action": ref.id,
          accept: "text/x-component",
          "content-type": "text/plain;charset=UTF-8",
          origin: app.url,
        },
        body: JSON.stringify([null, { name: "x".repeat(size) }]),
      });
    const small = await send(10);
    expect(small.status, key).toBe(200);
    const big = await send(300 * 1024);
    expect(big.status, key).toBe(413);
    expect((await fetch(`${app.url}/api/health`)).status).toBe(200);
  }, 60_000);
});
