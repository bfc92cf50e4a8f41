// One outbox worker in a process of its own (tests/integration/outbox-processes.test.ts starts two): says
// "ready", waits for "go" on stdin so both start together, delivers until the queue is empty, prints its count.
import { createInterface } from "node:readline";
import { createOutboxWorker } from "@/lib/notices/outbox-worker";
import { closeDb, db } from "@/models";

async function main() {
  const d = await db();
  const worker = createOutboxWorker({ digests: false, batchSize: 2, log: () => {} });
  console.log("ready");
  await new Promise<void>((resolve) => createInterface({ input: process.stdin }).once("line", () => resolve()));
  let sent = 0;
  for (;;) {
    sent += (await worker.runOnce()).sent;
    const left = await d.OutboxMessage.count({ where: { status: ["pending", "sending"] } });
    if (left === 0) break;
  }
  console.log(JSON.stringify({ sent }));
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
