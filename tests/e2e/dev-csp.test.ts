// `next dev` under the same Content-Security-Policy (its dev additions: 'unsafe-eval' and the HMR websocket):
// the sign-in page and two screens hydrate with zero violations. Compiling pages on demand is slow, so this
// runs when asked: E2E_DEV=1 npx vitest run tests/e2e/dev-csp.test.ts
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/lib/seed/demo-club";
import { freePort, hasBrowser, launchBrowser } from "./harness";

const run = hasBrowser && process.env.E2E_DEV === "1";

describe.runIf(run)("next dev under the Content-Security-Policy", () => {
  let child: ChildProcess;
  let dir = "";
  let appUrl = "";
  let browser: Browser;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), "sprintwright-dev-"));
    const port = await freePort();
    const url = `http://127.0.0.1:${port}`;
    const env = {
      ...process.env,
      NEXT_TELEMETRY_DISABLED: "1",
      NODE_ENV: "development",
      DATABASE_URL: `file:${join(dir, "app.sqlite")}`,
      NEXTAUTH_URL: url,
      APP_URL: url,
      NEXTAUTH_SECRET: "dev-e2e-secret-0123456789",
      NEXT_DIST_DIR: ".next-dev-e2e",
      MAILBOX_DIR: join(dir, "mailbox"),
    } as NodeJS.ProcessEnv;
    const prep = spawnSync(
      process.execPath,
      ["--conditions=react-server", "--import", "tsx", "scripts/db-prepare.ts"],
      { env, encoding: "utf8" },
    );
    if (prep.status !== 0) throw new Error(prep.stderr);
    child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "dev", "-p", String(port), "-H", "127.0.0.1"], {
      env,
      stdio: "ignore",
    });
    for (let i = 0; ; i++) {
      try {
        if ((await fetch(`${url}/api/health`)).ok) break;
      } catch {
        /* not up yet */
      }
      if (i > 600) throw new Error("next dev did not start");
      await new Promise((r) => setTimeout(r, 200));
    }
    appUrl = url;
    browser = await launchBrowser();
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    if (child && child.exitCode === null) {
      child.kill("SIGTERM");
      await new Promise((r) => child.once("exit", r));
    }
    rmSync(dir, { recursive: true, force: true });
  });

  it("hydrates sign-in, home and plan with zero violations", async () => {
    const context = await browser.newContext();
    const violations: string[] = [];
    await context.exposeBinding("__cspViolation", (_s, v: string) => void violations.push(v));
    await context.addInitScript(() => {
      document.addEventListener("securitypolicyviolation", (e) =>
        window.__cspViolation(`${location.pathname} ${e.violatedDirective} ${e.blockedURI}`),
      );
    });
    const page = await context.newPage();
    const first = await page.goto(`${appUrl}/sign-in`, { timeout: 180_000 });
    expect(first?.headers()["content-security-policy"]).toContain("'unsafe-eval'");
    // The harness's signIn waits 15 s; the first compile of /home can take longer.
    await page.getByLabel("E-mail").fill("head.coach@harbourvale.test");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 180_000 });
    for (const path of ["/home", "/plan"]) {
      await page.goto(`${appUrl}${path}`, { waitUntil: "networkidle", timeout: 180_000 });
      await page.waitForFunction(() => window.next !== undefined, null, {
        timeout: 60_000,
      });
    }
    expect(violations).toEqual([]);
    await context.close();
  }, 600_000);
});
