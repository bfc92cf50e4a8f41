// `npm run test:postgres [-- <vitest args>]`: the integration suite against a throwaway PostgreSQL cluster.
// Needs Debian's `postgresql` package (initdb and pg_ctl under /usr/lib/postgresql/<version>/bin). Starts a
// cluster in a temp dir on a free port (as the `postgres` user when run as root: initdb refuses root), runs
// vitest with DATABASE_URL pointing at it (tests/helpers/db.ts makes one database per test file), then stops
// the cluster and removes the dir. Not part of CI.
import { spawnSync } from "node:child_process";
import { chmodSync, chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir, userInfo } from "node:os";
import { join } from "node:path";

function pgBin(): string {
  const root = "/usr/lib/postgresql";
  const versions = existsSync(root) ? readdirSync(root).sort((a, b) => Number(b) - Number(a)) : [];
  const dir = versions.map((v) => join(root, v, "bin")).find((d) => existsSync(join(d, "initdb")));
  if (!dir) throw new Error("PostgreSQL is not installed: sudo apt-get install -y postgresql");
  return dir;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

const asRoot = userInfo().uid === 0;

/** Runs a PostgreSQL tool, as the `postgres` user when we are root. */
function pg(bin: string, tool: string, args: string[]) {
  const argv = asRoot ? ["-u", "postgres", "--", join(bin, tool), ...args] : args;
  const res = spawnSync(asRoot ? "runuser" : join(bin, tool), argv, { encoding: "utf8" });
  if (res.status !== 0) throw new Error(`${tool} failed:\n${res.stdout}\n${res.stderr}`);
  return res.stdout;
}

async function main() {
  const bin = pgBin();
  const dir = mkdtempSync(join(tmpdir(), "sprintwright-pg-"));
  const data = join(dir, "data");
  if (asRoot) {
    const id = (flag: string) => Number(spawnSync("id", [flag, "postgres"], { encoding: "utf8" }).stdout);
    chownSync(dir, id("-u"), id("-g"));
  }
  chmodSync(dir, 0o700);
  const port = await freePort();
  let status = 1;
  let started = false;
  try {
    pg(bin, "initdb", ["-D", data, "-U", "postgres", "-A", "trust", "-E", "UTF8", "--no-locale"]);
    // Throwaway data: no fsync. Enough connections for vitest's parallel files, each with its own pool.
    const options = `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200`;
    pg(bin, "pg_ctl", ["-D", data, "-l", join(dir, "server.log"), "-o", options, "-w", "start"]);
    started = true;
    console.log(`test:postgres: PostgreSQL (${bin}) on 127.0.0.1:${port}`);
    const extra = process.argv.slice(2);
    const res = spawnSync(
      process.execPath,
      ["node_modules/vitest/vitest.mjs", "run", ...(extra.length ? extra : ["tests/integration"])],
      {
        stdio: "inherit",
        env: { ...process.env, DATABASE_URL: `postgres://postgres@127.0.0.1:${port}/postgres` },
      },
    );
    status = res.status ?? 1;
  } finally {
    if (started) pg(bin, "pg_ctl", ["-D", data, "-m", "fast", "-w", "stop"]);
    rmSync(dir, { recursive: true, force: true });
  }
  process.exit(status);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
