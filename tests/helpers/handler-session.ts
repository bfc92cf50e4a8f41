// Route handlers called in-process over a temp SQLite file, with only next-auth's session lookup replaced and
// the notices hooks (e-mails, alerts) switched off. Import this before the handlers (they are imported with
// `await import(...)` after setupTestDb), then set `who.userId` to the member the request comes from.
import { vi } from "vitest";

/** The signed-in user the handlers see; null: nobody is signed in. */
export const who: { userId: number | null } = { userId: null };

vi.mock("next-auth", async (orig) => ({
  ...(await orig<typeof import("next-auth")>()),
  getServerSession: async () => (who.userId ? { user: { id: who.userId } } : null),
}));
vi.mock("@/lib/notices/hooks", () => ({ afterPlanChange: async () => {}, afterLogChange: async () => {} }));
