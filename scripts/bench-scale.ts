// `npm run bench:scale [-- --quick] [-- --only=60x5,20x30x2]`: issue 12's figures. Generates (or reuses from a
// temp-dir cache) SQLite databases with the project's seeders: the demo club, 60 athletes × 1, 3 and 5 seasons,
// and 20 clubs × 30 athletes × 2 seasons; builds the app once (`.next-bench`, reused while newer than the
// sources) and starts `next start` on each. For every read and one drop it measures single requests (p50/p95)
// and BENCH_CONNECTIONS (20) connections for BENCH_DURATION_S (5) s with autocannon (req/s, p99, errors), and
// prints each as a share of the floor (/api/health) measured against the same server, beside the targets.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import autocannon from "autocannon";
import { DateTime } from "luxon";
import { QueryTypes } from "sequelize";
import { apiSession, startApp, type App } from "../tests/e2e/app-server";
import { openDatabase } from "../models";
import { datasets, targetFor, type BenchDataset, type BenchMeta, type Endpoint } from "./bench-scale-sets";

const ROOT = process.cwd();
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 20);
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 5);
const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 40);
const SAMPLE_BUDGET_MS = 10_000;
/** A single request slower than this counts as an error (the server may still be working off a load run). */
const REQUEST_TIMEOUT_MS = 60_000;
const CACHE = join(tmpdir(), "sprintwright-bench-scale");
/** BENCH_DIST_DIR: measure a build made elsewhere (e.g. the browser tests' .next-e2e) as it is. */
const DIST = process.env.BENCH_DIST_DIR || ".next-bench";
const TSX = ["--conditions=react-server", "--import", "tsx"];

const args = process.argv.slice(2);
const quick = args.includes("--quick");
const only = args
  .find((a) => a.startsWith("--only="))
  ?.slice("--only=".length)
  .split(",");

function filesUnder(dir: string): string[] {
  const abs = join(ROOT, dir);
  if (!existsSync(abs)) return [];
  if (statSync(abs).isFile()) return [dir];
  return readdirSync(abs, { withFileTypes: true }).flatMap((e) =>
    e.name === "node_modules" || e.name.startsWith(".") ? [] : filesUnder(join(dir, e.name)),
  );
}

const hasScript = (name: string) =>
  Boolean(
    (JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8")) as { scripts: Record<string, string> }).scripts[name],
  );

/** Everything a generated database depends on: seeders, schema, engine (the ledger), the generator itself. */
function fingerprint(set: BenchDataset): string {
  const hash = createHash("sha256").update(JSON.stringify(set));
  const inputs = [
    "lib/seed",
    "migrations",
    "models",
    "lib/load",
    "lib/data",
    "scripts/bench-scale-data.ts",
    "scripts/bench-scale-sets.ts",
  ];
  for (const file of inputs.flatMap(filesUnder).sort()) hash.update(file).update(readFileSync(join(ROOT, file)));
  return hash.digest("hex").slice(0, 16);
}

function run(label: string, argv: string[], env: Record<string, string>, command = process.execPath) {
  const res = spawnSync(command, argv, {
    cwd: ROOT,
    env: { ...process.env, ...env },
    encoding: "utf8",
    stdio: ["ignore", "pipe", "inherit"],
  });
  if (res.status !== 0) throw new Error(`${label} failed:\n${res.stdout}`);
  return res.stdout;
}

/** The dataset's database from the cache, generated first when the cache has none for these sources. */
function database(set: BenchDataset): { file: string; meta: BenchMeta; cached: boolean; ledgerMs: number | null } {
  mkdirSync(CACHE, { recursive: true });
  const file = join(CACHE, `${set.key}-${fingerprint(set)}.sqlite`);
  if (existsSync(`${file}.json`)) {
    const meta = JSON.parse(readFileSync(`${file}.json`, "utf8")) as BenchMeta & { ledgerMs?: number | null };
    return { file, meta, cached: true, ledgerMs: meta.ledgerMs ?? null };
  }
  for (const old of readdirSync(CACHE).filter((f) => f.startsWith(`${set.key}-`)))
    rmSync(join(CACHE, old), { force: true });
  const partial = `${file}.partial`;
  rmSync(partial, { force: true });
  process.stdout.write(`  generating ${set.label}… `);
  run("generator", [...TSX, "scripts/bench-scale-data.ts", JSON.stringify(set), partial], {
    // The feed link is sealed with the app secret; the benchmark's server uses the same one.
    NEXTAUTH_SECRET: "e2e-secret-0123456789abcdef",
  });
  const meta = JSON.parse(readFileSync(`${partial}.json`, "utf8")) as BenchMeta;
  let ledgerMs: number | null = null;
  if (hasScript("db:rebuild-ledger")) {
    // Once the load ledger exists, every generated database gets it built by the project's own rebuild.
    const t0 = performance.now();
    run("db:rebuild-ledger", ["run", "--silent", "db:rebuild-ledger"], { DATABASE_URL: `file:${partial}` }, "npm");
    ledgerMs = Math.round(performance.now() - t0);
  }
  renameSync(partial, file);
  writeFileSync(`${file}.json`, JSON.stringify({ ...meta, ledgerMs }));
  rmSync(`${partial}.json`, { force: true });
  const ledger = ledgerMs !== null ? `, ledger ${(ledgerMs / 1000).toFixed(1)} s` : "";
  console.log(`${meta.sessions} sessions in ${(meta.seedMs / 1000).toFixed(1)} s${ledger}`);
  return { file, meta, cached: false, ledgerMs };
}

/** Builds into .next-bench unless a build there is newer than every source file. */
function prepareBuild() {
  process.env.E2E_DIST_DIR = DIST;
  const built = join(ROOT, DIST, "BUILD_ID");
  const sources = [
    "app",
    "components",
    "lib",
    "models",
    "emails",
    "proxy.ts",
    "instrumentation.ts",
    "next.config.mjs",
    "package.json",
  ];
  const newest = Math.max(...sources.flatMap(filesUnder).map((f) => statSync(join(ROOT, f)).mtimeMs));
  const given = Boolean(process.env.BENCH_DIST_DIR) && existsSync(built);
  const fresh =
    given ||
    (existsSync(built) && existsSync(join(ROOT, DIST, "sprintwright-run")) && statSync(built).mtimeMs > newest);
  if (fresh) process.env.E2E_REUSE_BUILD = "1";
  else process.env.SPRINTWRIGHT_RUN_ID = `bench-scale-${Date.now()}`;
  return fresh;
}

type Target = {
  endpoint: Endpoint;
  label: string;
  path: string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  /** A fresh body per request (the drop lands on a different cell each time). */
  body?: () => string;
  /** Status that counts as success (default: any 2xx). */
  expect?: number;
};

type Row = {
  set: string;
  endpoint: Endpoint;
  label: string;
  bytes: number;
  p50: number;
  p95: number;
  rps: number;
  p99: number;
  errors: number;
  share: number;
  status304?: boolean;
};

const ok = (t: Target, status: number) => (t.expect ? status === t.expect : status >= 200 && status < 300);

function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
}

async function once(app: App, t: Target): Promise<{ ms: number; status: number; bytes: number }> {
  const t0 = performance.now();
  const res = await fetch(`${app.url}${t.path}`, {
    method: t.method ?? "GET",
    headers: t.headers,
    body: t.body?.(),
    redirect: "manual",
    signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS),
  });
  const bytes = (await res.arrayBuffer()).byteLength;
  return { ms: performance.now() - t0, status: res.status, bytes };
}

const failed = (ms: number) => ({ ms, status: 0, bytes: 0 });

async function measure(set: BenchDataset, app: App, t: Target): Promise<Omit<Row, "share">> {
  const first = await once(app, t).catch(() => failed(REQUEST_TIMEOUT_MS));
  const none = { set: set.key, endpoint: t.endpoint, label: t.label, bytes: 0, rps: 0 };
  if (!ok(t, first.status)) return { ...none, p50: Number.NaN, p95: Number.NaN, p99: Number.NaN, errors: 1 };
  for (let i = 0; i < 3; i++) await once(app, t).catch(() => undefined);
  const times: number[] = [];
  const started = performance.now();
  let errors = 0;
  while (times.length < SAMPLES && (times.length < 5 || performance.now() - started < SAMPLE_BUDGET_MS)) {
    const r = await once(app, t).catch(() => failed(REQUEST_TIMEOUT_MS));
    if (!ok(t, r.status)) errors++;
    times.push(r.ms);
  }
  const result = await autocannon({
    url: `${app.url}${t.path}`,
    connections: CONNECTIONS,
    duration: DURATION_S,
    method: t.method ?? "GET",
    headers: t.headers,
    requests: t.body ? [{ setupRequest: (req) => ({ ...req, body: t.body!() }) }] : undefined,
  });
  const stats = Object.entries(result.statusCodeStats ?? {}) as [string, { count?: number }][];
  const bad = stats.reduce((n, [code, s]) => n + (ok(t, Number(code)) ? 0 : Number(s.count ?? 0)), 0);
  return {
    set: set.key,
    endpoint: t.endpoint,
    label: t.label,
    bytes: first.bytes,
    p50: percentile(times, 50),
    p95: percentile(times, 95),
    rps: result.requests.average,
    // No answer inside the run (every request slower than the run): no percentile to show.
    p99: result.requests.total > 0 ? result.latency.p99 : Number.NaN,
    errors: errors + result.errors + result.timeouts + bad,
    status304: t.expect === 304 ? first.status === 304 : undefined,
  };
}

async function benchSet(set: BenchDataset, file: string, meta: BenchMeta): Promise<Row[]> {
  const app = await startApp({ database: file, seed: false });
  try {
    const head = await apiSession(app, meta.headCoachEmail);
    const cookie = head.cookie();
    const sequelize = await openDatabase(app.dbPath);
    const [template] = await sequelize.query<{ id: number }>(
      "SELECT id FROM block_templates WHERE team_id = ? AND kind = 'tempo' ORDER BY id LIMIT 1",
      { replacements: [meta.teamId], type: QueryTypes.SELECT },
    );
    await sequelize.close();
    const feedPath = `/api/calendar/${meta.feedToken}.ics`;
    const etag = (await fetch(`${app.url}${feedPath}`)).headers.get("etag") ?? '"none"';
    // Drops land on the measured athlete's days 8–21 ahead, one template each: a drop as the planner sends it.
    const today = DateTime.fromISO(set.today);
    let n = 0;
    const drop = () =>
      JSON.stringify({
        from: "template",
        templateId: template.id,
        athleteId: meta.athleteId,
        date: today.plus({ days: 8 + (n++ % 14) }).toISODate(),
      });
    const json = { "content-type": "application/json", origin: app.url, cookie };
    const targets: Target[] = [
      { endpoint: "floor", label: "floor: /api/health", path: "/api/health" },
      { endpoint: "squad", label: "squad week", path: `/api/teams/${meta.teamId}/load`, headers: { cookie } },
      { endpoint: "plan", label: "week plan JSON", path: `/api/teams/${meta.teamId}/plan`, headers: { cookie } },
      { endpoint: "athlete", label: "athlete load", path: `/api/athletes/${meta.athleteId}/load`, headers: { cookie } },
      { endpoint: "page", label: "/plan page", path: "/plan", headers: { cookie } },
      { endpoint: "feed", label: "calendar feed", path: feedPath },
      {
        endpoint: "feed304",
        label: "calendar feed, If-None-Match",
        path: feedPath,
        headers: { "if-none-match": etag },
        expect: 304,
      },
      {
        endpoint: "drop",
        label: "drop (template → cell)",
        path: `/api/teams/${meta.teamId}/sessions`,
        method: "POST",
        headers: json,
        body: drop,
        expect: 201,
      },
    ];
    const rows: Omit<Row, "share">[] = [];
    for (const t of targets) {
      rows.push(await measure(set, app, t));
      process.stdout.write(".");
    }
    const floor = rows[0].rps;
    return rows.map((r) => ({ ...r, share: floor > 0 ? r.rps / floor : 0 }));
  } finally {
    await app.stop();
  }
}

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
const ms = (x: number) => (x >= 100 ? x.toFixed(0) : x.toFixed(1));
const size = (b: number) =>
  b >= 1024 * 1024 ? `${(b / 1024 / 1024).toFixed(2)} MB` : b >= 1024 ? `${(b / 1024).toFixed(0)} KB` : `${b} B`;

function printTable(sets: BenchDataset[], rows: Row[]) {
  const head = [
    "data",
    "read",
    "size",
    "p50 ms",
    "p95 ms",
    "req/s",
    "p99 ms",
    "errors",
    "share of floor",
    "target",
    "",
  ];
  const lines = rows.map((r) => {
    const target = targetFor(r.set, r.endpoint);
    const verdict = target ? (target.met(r) ? "met" : "NOT met") : "";
    const label = sets.find((s) => s.key === r.set)!.label;
    return [
      label,
      r.label,
      size(r.bytes),
      ms(r.p50),
      ms(r.p95),
      r.rps.toFixed(0),
      String(r.p99),
      String(r.errors),
      r.endpoint === "floor" ? "100 %" : pct(r.share),
      target?.text ?? "",
      verdict,
    ];
  });
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i].length)));
  const fmt = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i])).join(" | ")} |`;
  console.log(fmt(head));
  console.log(`|${widths.map((w) => "-".repeat(w + 2)).join("|")}|`);
  let last = "";
  for (const l of lines) {
    console.log(fmt([l[0] === last ? "" : l[0], ...l.slice(1)]));
    last = l[0];
  }
}

/** Flat in history: 5 seasons within 20 % of 1 season (req/s at 20 connections and single-request p50). */
function printFlat(rows: Row[]) {
  const one = rows.filter((r) => r.set === "60x1");
  const five = rows.filter((r) => r.set === "60x5");
  if (!one.length || !five.length) return;
  console.log("\nflat in history (60 × 5 seasons against 60 × 1 season; target: within 20 %)");
  for (const r5 of five) {
    if (r5.endpoint === "floor" || r5.endpoint === "drop") continue;
    const r1 = one.find((r) => r.endpoint === r5.endpoint)!;
    const rpsRatio = r5.rps / r1.rps;
    const p50Ratio = r5.p50 / r1.p50;
    const met = rpsRatio >= 0.8 && p50Ratio <= 1.2;
    console.log(
      `  ${r5.label.padEnd(30)} req/s ×${rpsRatio.toFixed(2)}  p50 ×${p50Ratio.toFixed(2)}  ${met ? "met" : "NOT met"}`,
    );
  }
}

async function main() {
  const today = DateTime.now().setZone("Europe/London").toISODate()!;
  const sets = datasets(today, quick).filter((s) => !only || only.includes(s.key));
  console.log(`bench:scale: ${sets.map((s) => s.key).join(", ")} (databases cached in ${CACHE})`);
  const dbs = sets.map((s) => ({ set: s, ...database(s) }));
  for (const d of dbs) if (d.cached) console.log(`  ${d.set.label}: cached (${d.meta.sessions} sessions)`);
  console.log(prepareBuild() ? `  reusing the build in ${DIST}` : `  building into ${DIST}…`);
  console.log(
    `${CONNECTIONS} connections × ${DURATION_S} s per read; load average ${loadavg()[0].toFixed(2)} at start`,
  );
  const rows: Row[] = [];
  for (const d of dbs) {
    process.stdout.write(`  measuring ${d.set.label} `);
    rows.push(...(await benchSet(d.set, d.file, d.meta)));
    console.log(" done");
    // Each set's figures as soon as they exist: a later set that fails leaves these on screen.
    printTable(
      sets,
      rows.filter((r) => r.set === d.set.key),
    );
  }
  console.log(
    `\nload average ${loadavg()[0].toFixed(2)} at end (2 cores shared: compare shares of the floor, not raw figures)\n`,
  );
  printTable(sets, rows);
  printFlat(rows);
  const ledger = dbs.find((d) => d.set.key === "60x5")?.ledgerMs;
  if (ledger !== undefined && ledger !== null) {
    console.log(
      `\nledger rebuild, 60 × 5 seasons: ${(ledger / 1000).toFixed(1)} s (target < 10 s) ${ledger < 10_000 ? "met" : "NOT met"}`,
    );
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
