// Several app processes on one database: two outbox workers in two real processes race over one queue, and
// the real fake SMTP server must receive every message exactly once (row claims are conditional UPDATEs that
// re-check status and lease, lib/data/outbox.ts; the affected-row count says who won).
import { spawn } from "node:child_process";
import { createInterface } from "node:readline";
import { describe, expect, it } from "vitest";
import { renderEmail } from "@/emails/layout";
import { enqueueMail } from "@/lib/data/outbox";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const n = await setupNotices();
const { d } = n;
const team = await createTestTeam(d, { name: "Two Process Club" });
const COUNT = 40;

function startWorker() {
  const child = spawn(
    process.execPath,
    ["--conditions=react-server", "--import", "tsx", "tests/helpers/outbox-process.ts"],
    { env: process.env, stdio: ["pipe", "pipe", "inherit"] },
  );
  const lines = createInterface({ input: child.stdout! });
  const ready = new Promise<void>((resolve) => lines.on("line", (l) => l === "ready" && resolve()));
  const result = new Promise<{ sent: number }>((resolve, reject) => {
    lines.on("line", (l) => l.startsWith("{") && resolve(JSON.parse(l) as { sent: number }));
    child.once("exit", (code) => (code === 0 ? undefined : reject(new Error(`worker exited with ${code}`))));
  });
  return { child, ready, result };
}

describe("outbox across processes", () => {
  it("two worker processes on one database send each message exactly once", { timeout: 120_000 }, async () => {
    const subjects = Array.from({ length: COUNT }, (_, i) => `Both ${String(i).padStart(2, "0")}`);
    await d.sequelize.transaction(async (transaction) => {
      for (const subject of subjects) {
        const mail = renderEmail({
          subject,
          heading: subject,
          parts: [{ kind: "paragraph", text: "Hi" }],
          footer: "Test",
        });
        await enqueueMail({ transaction, teamId: team.teamId, kind: "invitation", to: "two@process.test", mail });
      }
    });
    const workers = [startWorker(), startWorker()];
    await Promise.all(workers.map((w) => w.ready));
    for (const w of workers) w.child.stdin!.write("go\n");
    const [a, b] = await Promise.all(workers.map((w) => w.result));
    expect(a.sent + b.sent).toBe(COUNT);
    const received = (await n.mailTo("two@process.test")).map((m) => m.subject).sort();
    expect(received).toEqual(subjects);
    expect(await d.OutboxMessage.count({ where: { status: "sent" } })).toBe(COUNT);
    // Both took part (with 2 per claim and 40 messages, one finishing alone would be a sign they never raced).
    console.log(`outbox across processes: ${a.sent} + ${b.sent}`);
  });
});
