import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
// Plain Node (no vitest import) so benchmark scripts can start the app too.
import { chromium, type Browser, type Page } from "playwright-core";
import { DEMO_PASSWORD } from "@/lib/seed/demo-club";

const ROOT = process.cwd();
// E2E_DIST_DIR lets an engineer build into their own folder while others run browser tests too.
const DIST = process.env.E2E_DIST_DIR || ".next-e2e";
const NEXT = join(ROOT, "node_modules/next/dist/bin/next");
export const ARTIFACTS = join(ROOT, "tests/e2e/artifacts");
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const hasBrowser = existsSync(CHROMIUM_PATH);

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.unref();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Builds the app once per test run into .next-e2e. Parallel test files take a lock directory; the others
 * wait for the marker. E2E_REUSE_BUILD=1 keeps an existing build (handy when iterating on tests only).
 */
async function ensureBuilt(): Promise<void> {
  const runId = process.env.SPRINTWRIGHT_RUN_ID ?? "manual";
  const marker = join(ROOT, DIST, "sprintwright-run");
  const ready = () =>
    existsSync(marker) && (process.env.E2E_REUSE_BUILD === "1" || readFileSync(marker, "utf8") === runId);
  if (ready()) return;
  const lock = join(ROOT, `${DIST}.lock`);
  for (;;) {
    try {
      mkdirSync(lock);
      break;
    } catch {
      if (ready()) return;
      await sleep(500);
    }
  }
  try {
    if (ready()) return;
    const res = spawnSync(process.execPath, [NEXT, "build"], {
      cwd: ROOT,
      env: { ...process.env, NEXT_DIST_DIR: DIST, NODE_ENV: "production", NEXT_SKIP_TYPECHECK: "1" },
      encoding: "utf8",
    });
    if (res.status !== 0) throw new Error(`next build failed:\n${res.stdout}\n${res.stderr}`);
    writeFileSync(marker, runId);
  } finally {
    rmSync(lock, { recursive: true, force: true });
  }
}

export type App = { url: string; port: number; dbPath: string; env: Record<string, string>; stop: () => Promise<void> };

/**
 * Starts `next start` on a free port with its own migrated (and by default demo-seeded) SQLite database;
 * `database` starts from a copy of that file instead (benchmarks).
 */
export async function startApp({
  env = {},
  seed = true,
  database,
}: { env?: Record<string, string>; seed?: boolean; database?: string } = {}): Promise<App> {
  await ensureBuilt();
  const dir = mkdtempSync(join(tmpdir(), "sprintwright-e2e-"));
  const dbPath = join(dir, "app.sqlite");
  if (database) copyFileSync(database, dbPath);
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const appEnv: Record<string, string> = {
    DATABASE_URL: `file:${dbPath}`,
    NEXTAUTH_URL: url,
    APP_URL: url,
    NEXTAUTH_SECRET: "e2e-secret-0123456789abcdef",
    NEXT_DIST_DIR: DIST,
    MAILBOX_DIR: join(dir, "mailbox"),
    ...env,
  };
  const fullEnv = {
    NEXT_TELEMETRY_DISABLED: "1",
    ...process.env,
    ...appEnv,
    NODE_ENV: "production",
  } as NodeJS.ProcessEnv;
  const prep = spawnSync(
    process.execPath,
    ["--conditions=react-server", "--import", "tsx", "scripts/db-prepare.ts", ...(seed ? [] : ["--no-seed"])],
    { cwd: ROOT, env: fullEnv, encoding: "utf8" },
  );
  if (prep.status !== 0) throw new Error(`db-prepare failed:\n${prep.stdout}\n${prep.stderr}`);

  const child: ChildProcess = spawn(process.execPath, [NEXT, "start", "-p", String(port), "-H", "127.0.0.1"], {
    cwd: ROOT,
    env: fullEnv,
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout?.on("data", (b) => (output += b));
  child.stderr?.on("data", (b) => (output += b));
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${output}`);
    try {
      const res = await fetch(`${url}/api/auth/providers`);
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error(`next start did not answer in 30 s:\n${output}`);
    await sleep(150);
  }
  return {
    url,
    port,
    dbPath,
    env: appEnv,
    stop: async () => {
      if (child.exitCode === null) {
        child.kill("SIGTERM");
        await new Promise((r) => child.once("exit", r));
      }
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--no-first-run",
      "--disable-quic",
    ],
  });
}

/** Signs in through our own sign-in page and waits for the workspace. */
export async function signIn(page: Page, app: App, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${app.url}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 15_000 });
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`), fullPage: true });
}

/** Signs in over plain HTTP (csrf + credentials callback) for API tests; returns a fetch that sends the cookie. */
export async function apiSession(app: App, email: string, password = DEMO_PASSWORD) {
  const csrfRes = await fetch(`${app.url}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      jar.set(pair.slice(0, i), pair.slice(i + 1));
    }
  };
  keep(csrfRes);
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const login = await fetch(`${app.url}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(login);
  if (![...jar.keys()].some((k) => k.endsWith("next-auth.session-token")))
    throw new Error(`HTTP sign-in failed for ${email}`);
  return {
    cookie,
    fetch: (path: string, init: RequestInit = {}) =>
      fetch(`${app.url}${path}`, {
        ...init,
        redirect: "manual",
        headers: { ...(init.headers ?? {}), cookie: cookie() },
      }),
  };
}
