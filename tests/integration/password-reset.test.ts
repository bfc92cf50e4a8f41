import { describe, expect, it } from "vitest";
import { findOpenInvitation } from "@/lib/data/members";
import { acceptInvitation } from "@/lib/services/invitations";
import { requestPasswordReset } from "@/lib/services/password-reset";
import { verifyCredentials } from "@/lib/data/users";
import { TEST_PASSWORD, createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
await createTestTeam(d, { name: "Reset Club" });
const email = "coach@resetclub.test";

const outbox = () =>
  d.OutboxMessage.findAll({
    where: { kind: "password_reset" },
    attributes: ["toEmail", "text"],
    order: [["id", "ASC"]],
  });

describe("password reset", () => {
  it("queues one reset mail with a one-time link, and ignores unknown addresses", async () => {
    await requestPasswordReset({ email: "nobody@resetclub.test" });
    expect(await outbox()).toHaveLength(0);
    await requestPasswordReset({ email: " COACH@resetclub.test" });
    await requestPasswordReset({ email });
    const mails = await outbox();
    expect(mails.map((m) => m.toEmail)).toEqual([email]);
    const token = mails[0]!.text.match(/\/invite\/([A-Za-z0-9_-]{40,})/)![1];

    await acceptInvitation({ token, password: "a-brand-new-password" });
    expect(await verifyCredentials({ email, password: "a-brand-new-password" })).not.toBeNull();
    expect(await verifyCredentials({ email, password: TEST_PASSWORD })).toBeNull();
    await expect(acceptInvitation({ token, password: "third-password-here" })).rejects.toMatchObject({ status: 400 });
  });

  it("sends another link once the resend window has passed", async () => {
    await requestPasswordReset({ email, now: new Date(Date.now() + 3 * 60_000) });
    expect(await outbox()).toHaveLength(2);
  });

  it("spends every outstanding link when one of them is used", async () => {
    const before = (await outbox()).length;
    await requestPasswordReset({ email, now: new Date(Date.now() + 10 * 60_000) });
    await requestPasswordReset({ email, now: new Date(Date.now() + 20 * 60_000) });
    const links = (await outbox()).slice(before).map((m) => m.text.match(/\/invite\/([A-Za-z0-9_-]{40,})/)![1]);
    expect(links).toHaveLength(2);
    await acceptInvitation({ token: links[1]!, password: "fourth-password-here" });
    expect(await findOpenInvitation({ token: links[0]! })).toBeNull();
    await expect(acceptInvitation({ token: links[0]!, password: "attacker-password-1" })).rejects.toMatchObject({
      status: 400,
    });
    expect(await verifyCredentials({ email, password: "fourth-password-here" })).not.toBeNull();
  });

  it("applies the password rule on the server, the e-mail check included, and keeps the link for a better try", async () => {
    await requestPasswordReset({ email, now: new Date(Date.now() + 30 * 60_000) });
    const token = (await outbox()).at(-1)!.text.match(/\/invite\/([A-Za-z0-9_-]{40,})/)![1];
    for (const password of [" ".repeat(10), " ".repeat(12), "password1234", email, "coach@resetclub.test!"]) {
      await expect(acceptInvitation({ token, password }), JSON.stringify(password)).rejects.toMatchObject({
        status: 400,
        fields: { password: expect.any(Array) },
      });
    }
    expect(await findOpenInvitation({ token })).not.toBeNull();
    await acceptInvitation({ token, password: "fifth-password-here" });
  });
});
