// Real SMTP round trip: nodemailer → our fake smtp-server → mailbox files → listMail/readMail, invite parsed by ical.js.
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import ICAL from "ical.js";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildInvite } from "@/lib/calendar/invite";
import { startFakeSmtp, type FakeSmtp } from "@/lib/mail/fake-smtp";
import { readMailConfig } from "@/lib/mail/mail-config";
import { clearMailbox, listMail, readMail, readRawMail } from "@/lib/mail/mailbox";
import { isFakeMailbox, sendMail } from "@/lib/mail/transport";

let dir: string;
let fake: FakeSmtp;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "sw-mailbox-"));
  fake = await startFakeSmtp({ port: 0, dir });
});

afterAll(async () => {
  await fake?.close();
  await rm(dir, { recursive: true, force: true });
});

function config() {
  return readMailConfig({ NODE_ENV: "test", SMTP_URL: `smtp://127.0.0.1:${fake.port}`, MAILBOX_DIR: dir });
}

const invite = () =>
  buildInvite({
    method: "REQUEST",
    team: { name: "Harbour Vale Sprint Club", timeZone: "Europe/London" },
    organizer: { name: "Sam Reed", email: "sam.reed@harbourvale.test" },
    attendee: { name: "Maya Okafor", email: "maya@harbourvale.test" },
    sessions: [
      {
        id: "s-42",
        date: "2026-03-31",
        startTime: "18:00",
        durationMin: 60,
        title: "Flying 30s",
        status: "published",
        sequence: 1,
        updatedAt: new Date("2026-03-25T12:00:00Z"),
        blocks: [
          {
            kind: "max_velocity",
            title: "Flying 30s",
            running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
          },
        ],
      },
    ],
    appUrl: "https://sprintwright.test",
  });

describe("fake SMTP mailbox", () => {
  it("stores a sent HTML+text mail with its calendar invite, readable back", async () => {
    const subject = "Your week · Größe ✓";
    const messageId = await sendMail(
      {
        to: "maya@harbourvale.test",
        subject,
        html: "<p>Hello <strong>Maya</strong></p>",
        text: "Hello Maya",
        icalEvent: { method: "REQUEST", content: invite(), filename: "sessions.ics" },
      },
      config(),
    );
    expect(messageId).toMatch(/^<.+@.+>$/);

    const list = await listMail({ dir, to: "maya@harbourvale.test" });
    expect(list).toHaveLength(1);
    const [summary] = list;
    expect(summary?.subject).toBe(subject);
    expect(summary?.hasCalendar).toBe(true);
    expect(await listMail({ dir, to: "nobody@harbourvale.test" })).toEqual([]);

    const mail = await readMail({ dir, id: summary!.id });
    expect(mail?.subject).toBe(subject);
    expect(mail?.messageId).toBe(messageId);
    expect(mail?.from).toContain("no-reply@sprintwright.local");
    expect(mail?.to).toEqual(["maya@harbourvale.test"]);
    expect(mail?.envelope.rcptTo).toEqual(["maya@harbourvale.test"]);
    expect(mail?.text.trim()).toBe("Hello Maya");
    expect(mail?.html).toContain("<strong>Maya</strong>");

    const calendars = mail!.attachments.filter((a) => a.contentType.startsWith("text/calendar"));
    expect(calendars.length).toBeGreaterThan(0);
    const cal = new ICAL.Component(ICAL.parse(calendars[0]!.content));
    expect(cal.getFirstPropertyValue("method")).toBe("REQUEST");
    const event = new ICAL.Event(cal.getFirstSubcomponent("vevent")!);
    expect(event.uid).toBe("session-s-42@sprintwright");
    expect(event.startDate.toJSDate().toISOString()).toBe("2026-03-31T17:00:00.000Z"); // 18:00 BST

    const raw = await readRawMail({ dir, id: summary!.id });
    expect(raw?.toString("utf8")).toContain("Auto-Submitted: auto-generated");
  });

  it("lists newest first and leaves no temporary files behind", async () => {
    for (const n of [1, 2, 3]) {
      await sendMail(
        { to: "lena@harbourvale.test", subject: `Mail ${n}`, html: `<p>${n}</p>`, text: String(n) },
        config(),
      );
    }
    const list = await listMail({ dir, to: "lena@harbourvale.test" });
    expect(list.map((m) => m.subject)).toEqual(["Mail 3", "Mail 2", "Mail 1"]);
    expect((await listMail({ dir, limit: 2 })).length).toBe(2);
    expect((await readdir(dir)).filter((n) => n.endsWith(".tmp"))).toEqual([]);
  });

  it("rejects ids that could leave the mailbox folder", async () => {
    await expect(readMail({ dir, id: "../x" })).rejects.toThrow(/Not a mailbox id/);
    await expect(readMail({ dir, id: "20261201T214455123Z-abcdef01/../../etc/passwd" })).rejects.toThrow(
      /Not a mailbox id/,
    );
    expect(await readMail({ dir, id: "20000101T000000000Z-00000000" })).toBeNull();
  });

  it("says it is the fake mailbox only for a loopback host", () => {
    expect(isFakeMailbox(config())).toBe(true);
    expect(
      isFakeMailbox(readMailConfig({ NODE_ENV: "test", SMTP_URL: `smtp://127.0.0.1:${fake.port}`, MAIL_FAKE: "0" })),
    ).toBe(false);
    expect(
      isFakeMailbox(readMailConfig({ NODE_ENV: "development", SMTP_HOST: "smtp.example.test", SMTP_PORT: "587" })),
    ).toBe(false);
    expect(isFakeMailbox(readMailConfig({ NODE_ENV: "production", SMTP_URL: "smtp://127.0.0.1:2525" }))).toBe(false);
  });

  it("reads SMTP settings from the environment and names a wrong variable", () => {
    const c = readMailConfig({ SMTP_HOST: "smtp.example.test", SMTP_PORT: "465", SMTP_USER: "u", SMTP_PASS: "p" });
    expect(c).toMatchObject({
      host: "smtp.example.test",
      port: 465,
      secure: true,
      auth: { user: "u", pass: "p" },
      loopback: false,
    });
    expect(readMailConfig({}).port).toBe(2525);
    expect(readMailConfig({}).from).toBe("Sprintwright <no-reply@sprintwright.local>");
    expect(() => readMailConfig({ SMTP_URL: "http://x" })).toThrow(/SMTP_URL/);
    expect(() => readMailConfig({ SMTP_HOST: "h", SMTP_PORT: "99999" })).toThrow(/SMTP_PORT/);
    expect(() => readMailConfig({ NODE_ENV: "production" })).toThrow(/SMTP_URL/);
  });

  it("throws on a refused send so the outbox can retry", async () => {
    const closed = readMailConfig({ NODE_ENV: "test", SMTP_URL: "smtp://127.0.0.1:1" });
    await expect(sendMail({ to: "a@b.test", subject: "x", html: "<p>x</p>", text: "x" }, closed)).rejects.toThrow();
  });

  it("clears only its own files", async () => {
    const removed = await clearMailbox({ dir });
    expect(removed).toBe(4);
    expect(await listMail({ dir })).toEqual([]);
  });
});
