// Runs the local fake SMTP server on its own (the dev script spawns it). Port from SMTP_URL/SMTP_PORT, default 2525.
import { startFakeSmtp } from "../lib/mail/fake-smtp";
import { readMailConfig } from "../lib/mail/mail-config";

async function main(): Promise<void> {
  const config = readMailConfig({ ...process.env, NODE_ENV: process.env.NODE_ENV ?? "development" });
  if (!config.loopback) throw new Error(`The fake mailbox only listens on loopback, but SMTP host is ${config.host}`);
  // Listen exactly where the app's transport will connect.
  const host = config.host === "localhost" ? "127.0.0.1" : config.host.replace(/^\[|\]$/g, "");
  const fake = await startFakeSmtp({ host, port: config.port, dir: config.mailboxDir });
  console.log(`[mail-fake] listening on smtp://${fake.host}:${fake.port}, mailbox ${fake.dir}`);

  let stopping = false;
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    // A stuck client must not keep the process alive forever.
    setTimeout(() => process.exit(0), 3000).unref();
    void fake.close().then(() => {
      console.log(`[mail-fake] stopped (${signal})`);
      process.exit(0);
    });
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

main().catch((err: unknown) => {
  console.error(`[mail-fake] ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
