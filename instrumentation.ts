// Next calls register() once when a server process starts. The outbox worker delivers queued mail from
// the Node.js server only (never in the Edge runtime, never during `next build`).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  if (process.env.OUTBOX_WORKER === "0") return;
  const { startOutboxWorker } = await import("./lib/notices/outbox-worker");
  const pollMs = Number(process.env.OUTBOX_POLL_MS);
  startOutboxWorker(Number.isFinite(pollMs) && pollMs >= 100 ? { pollMs } : {});
}
