// Route handlers called in-process over a temp database, with next-auth's session lookup replaced by `who` and
// the notices hooks (e-mails, alerts, calendar invitations) switched as the test chooses. Import this before
// anything that imports the handlers (they are imported with `await import(...)` after setupTestDb), then set
// `who.userId` to the member the request comes from.
import { vi } from "vitest";
import type * as Hooks from "@/lib/notices/hooks";

/** The signed-in user the handlers see; null: nobody is signed in. */
export const who: { userId: number | null } = { userId: null };

type NoticeHooks = { [K in keyof typeof Hooks]: (typeof Hooks)[K] };

/**
 * What the notices hooks do: "off" (the default: nothing is queued), "on" (the real hooks, for tests of alerts,
 * mails and invitations), or the test's own functions (to record what they are told or to fail on purpose).
 */
export const notices: { hooks: "off" | "on" | NoticeHooks } = { hooks: "off" };

vi.mock("next-auth", async (orig) => ({
  ...(await orig<typeof import("next-auth")>()),
  getServerSession: async () => (who.userId ? { user: { id: who.userId } } : null),
}));

vi.mock("@/lib/notices/hooks", async (orig): Promise<NoticeHooks> => {
  const hooks = async (): Promise<NoticeHooks | null> =>
    notices.hooks === "off" ? null : notices.hooks === "on" ? orig<NoticeHooks>() : notices.hooks;
  return {
    afterPlanChange: async (args) => (await hooks())?.afterPlanChange(args),
    afterLogChange: async (args) => (await hooks())?.afterLogChange(args),
  };
});
