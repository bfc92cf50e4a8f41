// HTTP half of `npm run bench:load`: the squad-week handler as a signed-in head coach sees it, end to end
// (session check, SQLite reads, engine, JSON) against the built app with the demo seed. Prints p50/p95 and the
// target; it never fails on time (machines differ), it only reports.
import { loadavg } from "node:os";
import { apiSession, startApp } from "../tests/e2e/app-server";
import { DEMO_STAFF } from "../lib/seed/demo-club";

const REQUESTS = 200;
const WARMUP = 20;
const TARGET_P95_MS = 50;

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function main() {
  // A fresh build per run unless BENCH_REUSE_BUILD=1 (then any existing build in the dist dir is used).
  process.env.E2E_DIST_DIR ??= ".next-bench";
  process.env.SPRINTWRIGHT_RUN_ID ??= `bench-${Date.now()}`;
  if (process.env.BENCH_REUSE_BUILD === "1") process.env.E2E_REUSE_BUILD = "1";
  console.log(`bench:load http: building and starting the app (${process.env.E2E_DIST_DIR}) with the demo seed…`);
  const app = await startApp();
  try {
    const head = DEMO_STAFF.find((s) => s.role === "head_coach")!;
    const session = await apiSession(app, head.email);
    const me = (await (await session.fetch("/api/auth/session")).json()) as {
      user: { memberships: { teamId: number }[] };
    };
    const teamId = me.user.memberships[0].teamId;
    const path = `/api/teams/${teamId}/load?view=projected`;
    const first = await session.fetch(path);
    if (first.status !== 200) throw new Error(`${path} answered ${first.status}: ${await first.text()}`);
    const body = (await first.json()) as { rows: unknown[]; weekStart: string };
    const times: number[] = [];
    for (let i = 0; i < WARMUP + REQUESTS; i++) {
      const t0 = performance.now();
      const res = await session.fetch(path);
      await res.arrayBuffer();
      if (res.status !== 200) throw new Error(`request ${i} answered ${res.status}`);
      if (i >= WARMUP) times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const p50 = percentile(times, 50);
    const p95 = percentile(times, 95);
    console.log(
      `GET ${path} (week ${body.weekStart}, ${body.rows.length} athletes), ${REQUESTS} sequential requests after ${WARMUP} warm-up`,
    );
    console.log(`  p50 ${p50.toFixed(1)} ms · p95 ${p95.toFixed(1)} ms · max ${times[times.length - 1].toFixed(1)} ms`);
    console.log(
      `  target: p95 < ${TARGET_P95_MS} ms → ${p95 < TARGET_P95_MS ? "met" : "NOT met"} (load average ${loadavg()[0].toFixed(2)})`,
    );
  } finally {
    await app.stop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
