// Runs once per `vitest run` in the main process: a run id lets browser tests share one `next build`.
export default function setup() {
  process.env.SPRINTWRIGHT_RUN_ID ??= String(Date.now());
}
