// `npm run bench:http`: the built app (`next start`, demo club) under 20 concurrent connections for 10 s per
// endpoint, with /api/health as the floor. Prints req/s, p50, p99, connection errors and non-2xx answers, each
// beside its ratio to the floor. The bar checked here is correctness under load: zero errors and zero 5xx
// (exit code 1 otherwise). Latency targets belong to the load figures; this script only reports them.
import { loadavg } from "node:os";
import autocannon from "autocannon";
import { apiSession, startApp } from "../tests/e2e/app-server";
import { DEMO_ATHLETES, DEMO_STAFF } from "../lib/seed/demo-club";
import { openDatabase } from "../models";

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 20);
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);

type Target = { name: string; path: string; method?: "GET" | "PUT"; cookie?: string; body?: string; paths?: string[] };
type Row = {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
  fivexx: number;
  codes: string;
};

async function drive(base: string, t: Target): Promise<Row> {
  let next = 0;
  const result = await autocannon({
    url: `${base}${t.path}`,
    connections: CONNECTIONS,
    duration: DURATION_S,
    method: t.method ?? "GET",
    headers: {
      ...(t.cookie ? { cookie: t.cookie } : {}),
      ...(t.body ? { "content-type": "application/json", origin: base } : {}),
    },
    body: t.body,
    // A write target spreads over many sessions, as a squad logging after training would.
    requests: t.paths ? [{ setupRequest: (req) => ({ ...req, path: t.paths![next++ % t.paths!.length] }) }] : undefined,
  });
  const codes = Object.entries(result.statusCodeStats ?? {})
    .map(([code, s]) => `${code}×${s.count ?? 0}`)
    .join(" ");
  const fivexx = Object.entries(result.statusCodeStats ?? {}).reduce(
    (n, [code, s]) => n + (Number(code) >= 500 ? Number(s.count ?? 0) : 0),
    0,
  );
  return {
    name: t.name,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
    fivexx,
    codes,
  };
}

const ratio = (v: number, floor: number) => (floor > 0 ? `${(v / floor).toFixed(2)}×` : "—");

async function main() {
  // A fresh build per run unless BENCH_REUSE_BUILD=1 (then any existing build in the dist dir is used).
  process.env.E2E_DIST_DIR ??= ".next-bench";
  process.env.SPRINTWRIGHT_RUN_ID ??= `bench-${Date.now()}`;
  if (process.env.BENCH_REUSE_BUILD === "1") process.env.E2E_REUSE_BUILD = "1";
  console.log(`bench:http: building and starting the app (${process.env.E2E_DIST_DIR}) with the demo seed…`);
  const app = await startApp();
  const sequelize = await openDatabase(app.dbPath);
  try {
    const head = await apiSession(app, DEMO_STAFF.find((s) => s.role === "head_coach")!.email);
    const athleteEmail = DEMO_ATHLETES.find((a) => a.email)!.email!;
    const athlete = await apiSession(app, athleteEmail);
    const [[team]] = (await sequelize.query("SELECT id FROM teams ORDER BY id LIMIT 1")) as [{ id: number }[], unknown];
    const [[own]] = (await sequelize.query(
      "SELECT a.id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?",
      { replacements: [athleteEmail] },
    )) as [{ id: number }[], unknown];
    const feed = (await (await head.fetch(`/api/athletes/${own.id}/calendar-token`)).json()) as { url: string | null };
    if (!feed.url) throw new Error("the demo athlete has no calendar feed");
    // The squad's published sessions of the last fortnight: what athletes log after training.
    const [sessions] = (await sequelize.query(
      "SELECT id FROM planned_sessions WHERE team_id = ? AND status = 'published' AND date < date('now') ORDER BY date DESC LIMIT 60",
      { replacements: [team.id] },
    )) as [{ id: number }[], unknown];
    if (sessions.length === 0) throw new Error("the demo seed has no past published sessions to log");

    const targets: Target[] = [
      { name: "floor: GET /api/health", path: "/api/health" },
      { name: "squad load (head coach)", path: `/api/teams/${team.id}/load`, cookie: head.cookie() },
      { name: "week plan (head coach)", path: `/api/teams/${team.id}/plan`, cookie: head.cookie() },
      { name: "athlete load (athlete, own)", path: `/api/athletes/${own.id}/load`, cookie: athlete.cookie() },
      { name: "calendar feed (token)", path: new URL(feed.url).pathname },
      {
        name: `log write (head coach, ${sessions.length} sessions)`,
        path: `/api/sessions/${sessions[0].id}/log`,
        method: "PUT",
        cookie: head.cookie(),
        body: JSON.stringify({ completion: "yes", rpe: 6, minutes: 50 }),
        paths: sessions.map((s) => `/api/sessions/${s.id}/log`),
      },
    ];
    for (const t of targets) {
      const check = await fetch(`${app.url}${t.path}`, {
        method: t.method ?? "GET",
        headers: {
          ...(t.cookie ? { cookie: t.cookie } : {}),
          ...(t.body ? { "content-type": "application/json", origin: app.url } : {}),
        },
        body: t.body,
      });
      if (!check.ok)
        throw new Error(
          `${t.name}: ${t.path} answered ${check.status} before the run: ${(await check.text()).slice(0, 200)}`,
        );
    }

    console.log(
      `${CONNECTIONS} connections × ${DURATION_S} s per endpoint (load average ${loadavg()[0].toFixed(2)} at start)\n`,
    );
    const rows: Row[] = [];
    for (const t of targets) {
      rows.push(await drive(app.url, t));
      const r = rows[rows.length - 1];
      console.log(`  done: ${r.name} (${r.codes || "no answers"})`);
    }
    const floor = rows[0];
    const pad = (s: string, n: number) => s.padEnd(n);
    const num = (s: string, n: number) => s.padStart(n);
    console.log(
      `\n${pad("endpoint", 42)}${num("req/s", 9)}${num("×floor", 8)}${num("p50 ms", 9)}${num("×floor", 8)}` +
        `${num("p99 ms", 9)}${num("×floor", 8)}${num("errors", 8)}${num("non-2xx", 9)}${num("5xx", 6)}`,
    );
    for (const r of rows) {
      console.log(
        `${pad(r.name, 42)}${num(r.rps.toFixed(0), 9)}${num(ratio(r.rps, floor.rps), 8)}` +
          `${num(String(r.p50), 9)}${num(ratio(r.p50, floor.p50), 8)}${num(String(r.p99), 9)}${num(ratio(r.p99, floor.p99), 8)}` +
          `${num(String(r.errors), 8)}${num(String(r.non2xx), 9)}${num(String(r.fivexx), 6)}`,
      );
    }
    const bad = rows.filter((r) => r.errors > 0 || r.fivexx > 0);
    console.log(
      `\nbar: zero connection errors and zero 5xx → ${bad.length === 0 ? "met" : `NOT met (${bad.map((r) => r.name).join(", ")})`}` +
        ` (load average ${loadavg()[0].toFixed(2)} at end)`,
    );
    if (bad.length > 0) process.exitCode = 1;
  } finally {
    await sequelize.close();
    await app.stop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
