// `npm run dev`: migrate and (if empty) seed the local SQLite database, start the local services, then `next dev`.
import { spawn, type ChildProcess } from "node:child_process";
import { prepareDatabase } from "./prepare-db";
import { devServices } from "./dev-services";

async function main() {
  await prepareDatabase();
  const children: ChildProcess[] = [...(await devServices())];
  const port = process.env.PORT ?? "3000";
  const next = spawn(process.execPath, ["node_modules/next/dist/bin/next", "dev", "-p", port], {
    stdio: "inherit",
    env: { NEXT_TELEMETRY_DISABLED: "1", ...process.env },
  });
  children.push(next);
  const stop = () => {
    for (const c of children) c.kill("SIGTERM");
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  next.on("exit", (code) => {
    stop();
    process.exit(code ?? 0);
  });
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
