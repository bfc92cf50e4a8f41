import type { ChildProcess } from "node:child_process";

/** Local helper processes that `npm run dev` starts beside Next (e.g. the fake mail server). */
export async function devServices(): Promise<ChildProcess[]> {
  return [];
}
