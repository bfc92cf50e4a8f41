import { describe, expect, it } from "vitest";
import { acceptInvitation } from "@/lib/data/members";
import { requestPasswordReset } from "@/lib/data/password-reset";
import { verifyCredentials } from "@/lib/data/users";
import { TEST_PASSWORD, createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
await createTestTeam(d, { name: "Reset Club" });
const email = "coach@resetclub.test";

const outbox = () => d.OutboxMessage.findAll({ where: { kind: "password_reset" }, attributes: ["toEmail", "text"], order: [["id", "ASC"]] });

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
});
