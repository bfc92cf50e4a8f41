// The local mailbox holds every mail the app sent on this machine, reset links included. Each member must
// read only what was delivered to their own address; the head coach sees the team's queue without bodies.
// Real parts: the fake SMTP server on a free port, the outbox worker, the route handlers; only next-auth's
// session lookup is replaced by "who is asking".
import { describe, expect, it } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { requestPasswordReset } from "@/lib/services/password-reset";
import { enqueueMail, listDeliveryQueue } from "@/lib/data/outbox";
import { listMail } from "@/lib/mail/mailbox";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

// Alerts, calendar invitations and their e-mails run for real here.
notices.hooks = "on";

process.env.MAIL_FAKE = "1";
const n = await setupNotices();
const { d } = n;
const list = await import("@/app/api/mailbox/route");
const one = await import("@/app/api/mailbox/[mailId]/route");
const raw = await import("@/app/api/mailbox/[mailId]/raw/route");
const attachment = await import("@/app/api/mailbox/[mailId]/attachments/[index]/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const HEAD = "head@alphatrack.test";
const ada = a.users["ada@alphatrack.test"]!;

const as = (userId: number | null) => {
  who.userId = userId;
};
const get = (path: string) => new Request(`http://sprintwright.test${path}`);
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });

// The athlete asks for the head coach's reset (the forgot-password form is public) and the worker delivers it.
await requestPasswordReset({ email: HEAD });
const sameTx = await d.sequelize.transaction(async (transaction) =>
  enqueueMail({
    transaction,
    teamId: b.teamId,
    kind: "alert",
    to: "head@bravotrack.test",
    mail: { subject: "Bravo only", html: "<p>b</p>", text: "bravo secret" },
  }),
);
expect(sameTx).not.toBeNull();
await n.worker.runOnce();
const [resetSummary] = await listMail({ dir: n.dir, to: HEAD });
const resetId = resetSummary!.id;

async function json(res: Response) {
  return (await res.json()) as { mails?: Array<{ id: string; subject: string }>; mail?: { text: string } };
}

describe("local mailbox access", () => {
  it("delivered the reset link to the head coach's address", async () => {
    const mails = await n.mailTo(HEAD);
    expect(mails.map((m) => m.text).join("\n")).toMatch(/\/invite\/[A-Za-z0-9_-]{20,}/);
  });

  it("the athlete's list holds none of the head coach's mail", async () => {
    as(ada.userId);
    const res = await list.GET(get("/api/mailbox"), ctx({}));
    expect(res.status).toBe(200);
    const ids = (await json(res)).mails!.map((m) => m.id);
    expect(ids).not.toContain(resetId);
  });

  it("the athlete cannot ask for another address's mail", async () => {
    as(ada.userId);
    const res = await list.GET(get(`/api/mailbox?to=${encodeURIComponent(HEAD)}`), ctx({}));
    expect(res.status).toBe(403);
    expect(((await res.json()) as { error: { fields: Record<string, string[]> } }).error.fields.to).toBeDefined();
  });

  it("the athlete gets 404 for the reset mail, its raw message and its parts", async () => {
    as(ada.userId);
    expect((await one.GET(get(`/api/mailbox/${resetId}`), ctx({ mailId: resetId }))).status).toBe(404);
    expect((await raw.GET(get(`/api/mailbox/${resetId}/raw`), ctx({ mailId: resetId }))).status).toBe(404);
    expect(
      (await attachment.GET(get(`/api/mailbox/${resetId}/attachments/0`), ctx({ mailId: resetId, index: "0" }))).status,
    ).toBe(404);
  });

  it("other staff of the team cannot read it either, nor another team's head coach", async () => {
    for (const userId of [a.users.coach!.userId, a.users.physio!.userId, b.users.head_coach!.userId]) {
      as(userId);
      expect((await one.GET(get(`/api/mailbox/${resetId}`), ctx({ mailId: resetId }))).status).toBe(404);
      const ids = (await json(await list.GET(get("/api/mailbox"), ctx({})))).mails!.map((m) => m.id);
      expect(ids).not.toContain(resetId);
    }
  });

  it("the head coach reads their own reset mail, raw message included", async () => {
    as(a.users.head_coach!.userId);
    const mails = (await json(await list.GET(get("/api/mailbox"), ctx({})))).mails!;
    expect(mails.map((m) => m.id)).toEqual([resetId]);
    const res = await one.GET(get(`/api/mailbox/${resetId}`), ctx({ mailId: resetId }));
    expect(res.status).toBe(200);
    expect((await json(res)).mail!.text).toContain("/invite/");
    const rawRes = await raw.GET(get(`/api/mailbox/${resetId}/raw`), ctx({ mailId: resetId }));
    expect(rawRes.status).toBe(200);
    expect(rawRes.headers.get("cache-control")).toContain("no-store");
  });

  it("another team's mail stays with its recipient", async () => {
    as(a.users.head_coach!.userId);
    const subjects = (await json(await list.GET(get("/api/mailbox"), ctx({})))).mails!.map((m) => m.subject);
    expect(subjects).not.toContain("Bravo only");
    as(b.users.head_coach!.userId);
    expect((await json(await list.GET(get("/api/mailbox"), ctx({})))).mails!.map((m) => m.subject)).toEqual([
      "Bravo only",
    ]);
  });

  it("the head coach's delivery queue names who, what kind and the state, never a subject or body", async () => {
    const rows = await listDeliveryQueue({ teamId: a.teamId });
    expect(rows.map((r) => [r.toEmail, r.kind, r.status])).toEqual([[HEAD, "password_reset", "sent"]]);
    expect(Object.keys(rows[0]!).sort()).toEqual([
      "attempts",
      "createdAt",
      "id",
      "kind",
      "nextAttemptAt",
      "sentAt",
      "status",
      "toEmail",
    ]);
    expect(JSON.stringify(rows)).not.toMatch(/invite|reset your|subject/i);
  });

  it("emptying the mailbox removes only the asker's own mail", async () => {
    as(ada.userId);
    const res = await list.DELETE(get("/api/mailbox"), ctx({}));
    expect(res.status).toBe(200);
    expect(await listMail({ dir: n.dir, to: HEAD })).toHaveLength(1);
  });

  it("signed out gets 401", async () => {
    as(null);
    expect((await list.GET(get("/api/mailbox"), ctx({}))).status).toBe(401);
    expect((await one.GET(get(`/api/mailbox/${resetId}`), ctx({ mailId: resetId }))).status).toBe(401);
  });
});
