// The app with mail switched on for browser journeys: our fake SMTP server on a free port in the test
// process, and the app (next start) sending to it through its outbox worker.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { startFakeSmtp, type FakeSmtp } from "@/lib/mail/fake-smtp";
import { listMail, readMail, type StoredMail } from "@/lib/mail/mailbox";
import { openDatabase } from "@/models";
import { startApp, type App } from "./harness";

export type MailApp = App & {
  smtp: FakeSmtp;
  mailDir: string;
  waitForMail: (to: string, match: (m: StoredMail) => boolean, timeoutMs?: number) => Promise<StoredMail>;
  query: <T>(sql: string, replacements?: unknown[]) => Promise<T[]>;
};

export async function startMailApp(): Promise<MailApp> {
  const mailDir = mkdtempSync(join(tmpdir(), "sw-e2e-mail-"));
  const smtp = await startFakeSmtp({ port: 0, dir: mailDir });
  const app = await startApp({
    env: { SMTP_URL: `smtp://127.0.0.1:${smtp.port}`, MAILBOX_DIR: mailDir, MAIL_FAKE: "1", OUTBOX_POLL_MS: "300" },
  });
  const sequelize = await openDatabase(app.dbPath);

  async function waitForMail(to: string, match: (m: StoredMail) => boolean, timeoutMs = 15_000): Promise<StoredMail> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      for (const summary of await listMail({ dir: mailDir, to })) {
        const mail = await readMail({ dir: mailDir, id: summary.id });
        if (mail && match(mail)) return mail;
      }
      if (Date.now() > deadline) throw new Error(`no matching mail to ${to} within ${timeoutMs} ms`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }

  return {
    ...app,
    smtp,
    mailDir,
    waitForMail,
    query: async <T>(sql: string, replacements: unknown[] = []) =>
      (await sequelize.query(sql, { replacements }))[0] as T[],
    stop: async () => {
      await sequelize.close();
      await app.stop();
      await smtp.close();
      rmSync(mailDir, { recursive: true, force: true });
    },
  };
}
