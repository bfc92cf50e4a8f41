// Shared by the notices/calendar integration tests: a temp SQLite DB, the real fake SMTP server on a free
// port writing to a temp mailbox folder, and an outbox worker pointed at it.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll } from "vitest";
import { startFakeSmtp, type FakeSmtp } from "@/lib/mail/fake-smtp";
import { listMail, readMail, type StoredMail } from "@/lib/mail/mailbox";
import { createOutboxWorker, type OutboxWorkerOptions } from "@/lib/notices/outbox-worker";
import { setupTestDb } from "../helpers/db";

const APP_URL = "http://sprintwright.test";

export async function setupNotices(options: OutboxWorkerOptions = {}) {
  // Before anything reads lib/env (it caches): links in mails point here.
  process.env.APP_URL = APP_URL;
  const d = await setupTestDb();
  const dir = mkdtempSync(join(tmpdir(), "sw-notices-mail-"));
  process.env.MAILBOX_DIR = dir;
  const state: { smtp: FakeSmtp | null; port: number } = { smtp: null, port: 0 };

  async function startSmtp() {
    state.smtp = await startFakeSmtp({ port: state.port, dir });
    state.port = state.smtp.port;
    process.env.SMTP_URL = `smtp://127.0.0.1:${state.port}`;
  }
  async function stopSmtp() {
    await state.smtp?.close();
    state.smtp = null;
  }
  await startSmtp();

  const worker = createOutboxWorker({ digests: false, log: () => {}, ...options });
  afterAll(async () => {
    await worker.stop();
    await stopSmtp();
    rmSync(dir, { recursive: true, force: true });
  });

  async function mailTo(email: string): Promise<StoredMail[]> {
    const list = await listMail({ dir, to: email });
    const mails = await Promise.all(list.map((m) => readMail({ dir, id: m.id })));
    return mails.filter((m): m is StoredMail => m !== null).reverse(); // oldest first
  }

  return { d, dir, worker, startSmtp, stopSmtp, mailTo, smtpPort: () => state.port };
}
