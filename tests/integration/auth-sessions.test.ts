import { describe, expect, it } from "vitest";
import { IDLE_MINUTES, MAX_HOURS } from "@/lib/auth/session-policy";
import { endSession, sessionWritesSettled, startSession, touchSession as touchNow } from "@/lib/data/auth-sessions";
import { acceptInvitation } from "@/lib/services/invitations";
import { requestPasswordReset } from "@/lib/services/password-reset";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { users } = await createTestTeam(d, { name: "Session Club" });
const userId = users.coach!.userId;
const minutes = (n: number, from: Date) => new Date(from.getTime() + n * 60_000);
// Activity is recorded in the background; wait for it so the next check sees it.
async function touchSession(input: Parameters<typeof touchNow>[0]) {
  const alive = await touchNow(input);
  await sessionWritesSettled();
  return alive;
}

// OWASP ASVS 4.0 §3.3: sessions end on sign-out (3.3.1), after an idle period and an absolute lifetime (3.3.2),
// and every session of the account ends when its password changes (3.3.3).
describe("server-side sessions", () => {
  it("stay alive while used, and end after the idle timeout", async () => {
    const t0 = new Date();
    const sid = await startSession({ userId, now: t0 });
    expect(await touchSession({ sid, userId, now: minutes(IDLE_MINUTES - 1, t0) })).toBe(true);
    // Each use pushes the idle deadline on.
    expect(await touchSession({ sid, userId, now: minutes(2 * IDLE_MINUTES - 2, t0) })).toBe(true);
    expect(await touchSession({ sid, userId, now: minutes(3 * IDLE_MINUTES, t0) })).toBe(false);
    // Once ended, it stays ended.
    expect(await touchSession({ sid, userId, now: minutes(3 * IDLE_MINUTES, t0) })).toBe(false);
  });

  it("end at the absolute lifetime however busy they are", async () => {
    const t0 = new Date();
    const sid = await startSession({ userId, now: t0 });
    let alive = true;
    for (let m = 10; m < MAX_HOURS * 60; m += 10) alive &&= await touchSession({ sid, userId, now: minutes(m, t0) });
    expect(alive).toBe(true);
    expect(await touchSession({ sid, userId, now: minutes(MAX_HOURS * 60, t0) })).toBe(false);
  });

  it("end on sign-out, and only that one", async () => {
    const a = await startSession({ userId });
    const b = await startSession({ userId });
    await endSession({ sid: a });
    expect(await touchSession({ sid: a, userId })).toBe(false);
    expect(await touchSession({ sid: b, userId })).toBe(true);
  });

  it("refuse an id that is unknown or belongs to someone else", async () => {
    const sid = await startSession({ userId });
    expect(await touchSession({ sid: "x".repeat(43), userId })).toBe(false);
    expect(await touchSession({ sid, userId: users["ada@sessionclub.test"]!.userId })).toBe(false);
  });

  it("all end when the password is reset", async () => {
    const sessions = [await startSession({ userId }), await startSession({ userId })];
    const other = await startSession({ userId: users.physio!.userId });
    await requestPasswordReset({ email: "coach@sessionclub.test" });
    const mail = await d.OutboxMessage.findOne({ where: { kind: "password_reset" }, attributes: ["text"] });
    const token = mail!.text.match(/\/invite\/([A-Za-z0-9_-]{40,})/)![1];
    await acceptInvitation({ token, password: "a-fresh-start-2026" });
    for (const sid of sessions) expect(await touchSession({ sid, userId })).toBe(false);
    expect(await touchSession({ sid: other, userId: users.physio!.userId })).toBe(true);
    expect(await d.AuthSession.count({ where: { userId } })).toBe(0);
  });
});
