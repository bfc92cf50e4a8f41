import { spawn, type ChildProcess } from "node:child_process";
import { readMailConfig } from "../lib/mail/mail-config";
import { isFakeMailbox } from "../lib/mail/transport";

/** Local helper processes that `npm run dev` starts beside Next (e.g. the fake mail server). */
export async function devServices(): Promise<ChildProcess[]> {
  const children: ChildProcess[] = [];
  // The local fake SMTP server, unless SMTP_URL points at a real one (or MAIL_FAKE=0).
  if (isFakeMailbox(readMailConfig({ ...process.env, NODE_ENV: process.env.NODE_ENV ?? "development" }))) {
    const fake = spawn(process.execPath, ["--import", "tsx", "scripts/mail-fake.ts"], {
      stdio: "inherit",
      env: process.env,
    });
    fake.on("exit", (code) => {
      // Mail stays queued in the outbox and goes out once a server listens again.
      if (code) console.warn(`[dev] the local mail server stopped (exit ${code}); mail waits in the outbox`);
    });
    children.push(fake);
  }
  return children;
}
