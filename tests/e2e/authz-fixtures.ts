// The people and fresh resources the authorization matrix and the fuzz test act on, made through the app's
// own HTTP handlers (as the head coach or physio would) or, where no handler exists, straight in SQLite.
import { createHash } from "node:crypto";
import nodemailer from "nodemailer";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { hashPassword } from "@/lib/data/users";
import { listMail, readMail } from "@/lib/mail/mailbox";
import { apiSession } from "./harness";
import type { MailApp } from "./notices-app";

export const SUBJECTS = ["anon", "own", "other", "physio", "coach", "head", "outsider"] as const;
export type Subject = (typeof SUBJECTS)[number];

export type Client = { fetch: (path: string, init?: RequestInit) => Promise<Response> };
type Row = Record<string, unknown>;

const OUTSIDER = { email: "head@otherclub.test", password: "outsider-pass-2026", team: "Northfield Hurdles" };
const staff = (role: string) => DEMO_STAFF.find((s) => s.role === role)!.email;
const [MAYA, JONAH] = DEMO_ATHLETES.filter((a) => a.email).map((a) => a.email!);

/** A signed-in world over one running app: team A (the demo club) and a head coach of another team. */
export async function setupWorld(app: MailApp) {
  const one = async <T extends Row>(sql: string, args: unknown[] = []) => (await app.query<T>(sql, args))[0];
  const now = sqlNow();
  const teamId = (await one<{ id: number }>("SELECT id FROM teams ORDER BY id LIMIT 1")).id;
  const athleteOf = async (email: string) =>
    (
      await one<{ id: number }>("SELECT a.id FROM athletes a JOIN users u ON u.id = a.user_id WHERE u.email = ?", [
        email,
      ])
    ).id;
  const maya = { id: await athleteOf(MAYA), email: MAYA };
  const jonah = { id: await athleteOf(JONAH), email: JONAH };

  // Another team with its own head coach: everything of team A must answer it 404.
  await app.query(
    "INSERT INTO teams (name, time_zone, week_start_day, created_at, updated_at) VALUES (?, 'Europe/London', 1, ?, ?)",
    [OUTSIDER.team, now, now],
  );
  const otherTeamId = (await one<{ id: number }>("SELECT id FROM teams WHERE name = ?", [OUTSIDER.team])).id;
  await app.query("INSERT INTO team_load_settings (team_id, created_at, updated_at) VALUES (?, ?, ?)", [
    otherTeamId,
    now,
    now,
  ]);
  await app.query(
    "INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, 'Orla Outsider', ?, ?, ?)",
    [OUTSIDER.email, await hashPassword(OUTSIDER.password), now, now],
  );
  const outsiderId = (await one<{ id: number }>("SELECT id FROM users WHERE email = ?", [OUTSIDER.email])).id;
  await app.query(
    "INSERT INTO memberships (user_id, team_id, role, created_at, updated_at) VALUES (?, ?, 'head_coach', ?, ?)",
    [outsiderId, otherTeamId, now, now],
  );

  const anon: Client = { fetch: (path, init = {}) => fetch(`${app.url}${path}`, { ...init, redirect: "manual" }) };
  const clients: Record<Subject, Client> = {
    anon,
    own: await apiSession(app, MAYA),
    other: await apiSession(app, MAYA),
    physio: await apiSession(app, staff("physio")),
    coach: await apiSession(app, staff("coach")),
    head: await apiSession(app, staff("head_coach")),
    outsider: await apiSession(app, OUTSIDER.email, OUTSIDER.password),
  };
  return new World(app, teamId, otherTeamId, { maya, jonah }, clients);
}

/** Columns written in the background, not by the request under test (see World.checksum). */
const BACKGROUND_COLUMNS: Record<string, string[] | "all but id"> = {
  outbox_messages: "all but id",
  auth_sessions: ["last_seen_at", "updated_at"],
};

/**
 * Tables that only cache what the checked tables already say, and that a read may bring up to date: the load
 * ledger (engine output from sessions, blocks, logs, profiles and settings; its equality with a full rebuild is
 * proven in tests/integration/load-ledger-property.test.ts), its change marks, and the rendered calendar feeds.
 */
const DERIVED_TABLES = new Set(["load_ledger", "load_ledger_dirty", "calendar_feed_renders"]);

let counter = 0;
/** Timestamps as Sequelize writes them to SQLite, so rows made here read back like the app's own. */
const sqlNow = () => new Date().toISOString().replace("T", " ").replace("Z", " +00:00");
let speedTestDays = 0;
const unique = (what: string) => `${what} ${Date.now().toString(36)}-${++counter}`;
const json = (body: unknown): RequestInit => ({
  body: JSON.stringify(body),
  headers: { "content-type": "application/json" },
});

/** A strength block: no running prescription, so no physio restriction ever applies to it. */
export const STRENGTH_BLOCK = {
  kind: "strength",
  title: "Trap-bar pulls",
  running: null,
  drills: null,
  notes: null,
} as const;

export class World {
  constructor(
    readonly app: MailApp,
    readonly teamId: number,
    readonly otherTeamId: number,
    readonly athletes: { maya: { id: number; email: string }; jonah: { id: number; email: string } },
    readonly clients: Record<Subject, Client>,
  ) {}

  /** The athlete a subject's request is about: their own for "own", someone else's for everyone else. */
  target(subject: Subject) {
    return subject === "own" ? this.athletes.maya : this.athletes.jonah;
  }

  async as(subject: Subject, method: string, path: string, body?: unknown): Promise<Response> {
    const init: RequestInit = { method, ...(body === undefined ? {} : json(body)) };
    // A browser sends its Origin on every state-changing request; the handlers may insist on it.
    init.headers = { ...(init.headers as Record<string, string> | undefined), origin: this.app.url };
    return this.clients[subject].fetch(path, init);
  }

  private async ok(res: Response, what: string): Promise<Row> {
    const text = await res.text();
    if (!res.ok) throw new Error(`fixture ${what} answered ${res.status}: ${text}`);
    return text ? (JSON.parse(text) as Row) : {};
  }

  today(offsetDays = 0): string {
    const d = new Date(Date.now() + offsetDays * 86_400_000);
    return d.toLocaleDateString("en-CA", { timeZone: "Europe/London" });
  }

  /** A fresh timing test with a fitted result (lib/speed/README.md T4), each on a day of its own so it can be accepted. */
  async speedTest(athleteId: number): Promise<number> {
    const now = sqlNow();
    const day = new Date(Date.UTC(2019, 0, 1) + ++speedTestDays * 86_400_000).toISOString().slice(0, 10);
    const result = JSON.stringify({
      fit: { vmax: 9.5, tau: 1.1, residuals: [], rmseTimeS: 0, iterations: 1 },
      profile: null,
    });
    await this.app.query(
      "INSERT INTO speed_tests (team_id, athlete_id, kind, test_date, start_type, data, result, created_at, updated_at) " +
        "VALUES (?, ?, 'timing', ?, 'standing', '{}', ?, ?, ?)",
      [this.teamId, athleteId, day, result, now, now],
    );
    const [row] = await this.app.query<{ id: number }>("SELECT max(id) AS id FROM speed_tests");
    return row.id;
  }

  /** The athlete's name as the team spelled it (a CSV upload names athletes). */
  async athleteName(athleteId: number): Promise<string> {
    const [row] = await this.app.query<{ name: string }>("SELECT name FROM athletes WHERE id = ?", [athleteId]);
    return row.name;
  }

  /** A fresh published session (yesterday, so it can be logged) with one block, written straight to SQLite. */
  async session(athleteId: number): Promise<{ id: number; version: number; blockId: number }> {
    const now = sqlNow();
    const title = unique("Matrix session");
    await this.app.query(
      "INSERT INTO planned_sessions (team_id, athlete_id, date, start_time, duration_min, title, planned_rpe, status, notes, " +
        "version, sequence, published_at, created_at, updated_at) VALUES (?, ?, ?, '16:00', 45, ?, 5, 'published', NULL, 1, 0, ?, ?, ?)",
      [this.teamId, athleteId, this.today(-1), title, now, now, now],
    );
    const [row] = await this.app.query<{ id: number; version: number }>(
      "SELECT id, version FROM planned_sessions WHERE title = ?",
      [title],
    );
    await this.app.query(
      "INSERT INTO session_blocks (session_id, template_id, position, kind, title, running, drills, notes, created_at, updated_at) " +
        "VALUES (?, NULL, 0, ?, ?, NULL, NULL, NULL, ?, ?)",
      [row.id, STRENGTH_BLOCK.kind, STRENGTH_BLOCK.title, now, now],
    );
    const [block] = await this.app.query<{ id: number }>("SELECT id FROM session_blocks WHERE session_id = ?", [
      row.id,
    ]);
    return { id: row.id, version: row.version, blockId: block.id };
  }

  async template(): Promise<number> {
    const body = await this.ok(
      await this.as("head", "POST", `/api/teams/${this.teamId}/templates`, {
        ...STRENGTH_BLOCK,
        title: unique("Matrix template"),
        durationMin: 30,
        plannedRpe: 4,
      }),
      "create template",
    );
    return (body.template as { id: number }).id;
  }

  async restriction(athleteId: number): Promise<number> {
    const res = await this.as("physio", "POST", `/api/athletes/${athleteId}/restrictions`, {
      rule: "contact_cap",
      maxContacts: 400,
      startsOn: this.today(),
      endsOn: null,
      note: "Matrix check: contacts capped",
    });
    return ((await this.ok(res, "create restriction")).restriction as { id: number }).id;
  }

  /** A fresh Monday far ahead, two weeks after the last one handed out: phases there never overlap. */
  farMonday(): string {
    return new Date(Date.UTC(2032, 0, 5) + ++counter * 14 * 86_400_000).toISOString().slice(0, 10);
  }

  /** A fresh team-wide season phase of one far week, written straight to SQLite. */
  async phase(): Promise<{ id: number; startsOn: string; endsOn: string }> {
    const now = sqlNow();
    const startsOn = this.farMonday();
    const endsOn = new Date(Date.parse(startsOn) + 6 * 86_400_000).toISOString().slice(0, 10);
    const name = unique("Matrix phase");
    await this.app.query(
      "INSERT INTO season_phases (team_id, group_id, kind, name, starts_on, ends_on, goal, targets, version, created_at, updated_at) " +
        "VALUES (?, NULL, 'general_preparation', ?, ?, ?, '', '{}', 1, ?, ?)",
      [this.teamId, name, startsOn, endsOn, now, now],
    );
    const [row] = await this.app.query<{ id: number }>("SELECT id FROM season_phases WHERE name = ?", [name]);
    return { id: row.id, startsOn, endsOn };
  }

  /** A fresh team-wide meet on a far date. */
  async meet(): Promise<number> {
    const now = sqlNow();
    const name = unique("Matrix meet");
    await this.app.query(
      "INSERT INTO meets (team_id, group_id, athlete_id, name, date, priority, created_at, updated_at) " +
        "VALUES (?, NULL, NULL, ?, ?, 'C', ?, ?)",
      [this.teamId, name, this.farMonday(), now, now],
    );
    const [row] = await this.app.query<{ id: number }>("SELECT id FROM meets WHERE name = ?", [name]);
    return row.id;
  }

  /** A fresh open alert about the athlete (a far week, so no real flag shares its key). */
  async alert(athleteId: number): Promise<number> {
    const now = sqlNow();
    const week = new Date(Date.UTC(2030, 0, 7) + ++counter * 7 * 86_400_000).toISOString().slice(0, 10);
    await this.app.query(
      "INSERT INTO alerts (team_id, athlete_id, kind, level, metric, value, threshold, date, week_start, basis, " +
        "reason, provisional, flagged, status, created_at, updated_at) " +
        "VALUES (?, ?, 'weekly_jump', 'caution', 'srpe', 1.4, 1.15, ?, ?, 'planned', 'Matrix check: planned load up 40 % on last week', " +
        "0, 1, 'open', ?, ?)",
      [this.teamId, athleteId, week, week, now, now],
    );
    const [row] = await this.app.query<{ id: number }>(
      "SELECT id FROM alerts WHERE team_id = ? ORDER BY id DESC LIMIT 1",
      [this.teamId],
    );
    return row.id;
  }

  /** A throwaway coach of team A (for role changes and removals). */
  async membership(): Promise<number> {
    const now = sqlNow();
    const email = `${unique("spare").replace(/\W+/g, "-")}@harbourvale.test`;
    await this.app.query(
      "INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, 'Spare Coach', NULL, ?, ?)",
      [email, now, now],
    );
    const [user] = await this.app.query<{ id: number }>("SELECT id FROM users WHERE email = ?", [email]);
    await this.app.query(
      "INSERT INTO memberships (user_id, team_id, role, created_at, updated_at) VALUES (?, ?, 'coach', ?, ?)",
      [user.id, this.teamId, now, now],
    );
    const [m] = await this.app.query<{ id: number }>("SELECT id FROM memberships WHERE user_id = ?", [user.id]);
    return m.id;
  }

  /** The athlete's current calendar-feed path (a new link when none is active). */
  async feedPath(athleteId: number): Promise<string> {
    let status = await this.ok(
      await this.as("head", "GET", `/api/athletes/${athleteId}/calendar-token`),
      "feed status",
    );
    if (!status.url)
      status = await this.ok(await this.as("head", "POST", `/api/athletes/${athleteId}/calendar-token`), "rotate feed");
    return new URL(String(status.url)).pathname;
  }

  /** A mail with an attachment addressed to the athlete, through a real SMTP conversation with the fake server. */
  async mail(to: string): Promise<string> {
    for (const m of await listMail({ dir: this.app.mailDir, to })) {
      const stored = await readMail({ dir: this.app.mailDir, id: m.id });
      if (stored?.subject.startsWith("Matrix mail") && stored.attachments.length > 0) return m.id;
    }
    const subject = unique("Matrix mail");
    const transport = nodemailer.createTransport({
      host: "127.0.0.1",
      port: this.app.smtp.port,
      secure: false,
      ignoreTLS: true,
    });
    await transport.sendMail({
      from: "club@harbourvale.test",
      to,
      subject,
      text: "Private to the addressee.",
      attachments: [{ filename: "note.txt", content: "private" }],
    });
    transport.close();
    const stored = await this.app.waitForMail(to, (m) => m.subject === subject);
    return stored.id;
  }

  /**
   * A SHA-256 over every row of every table (SQLite writes each table out as one JSON text), to show that a
   * refused request changed nothing. Columns the app updates in the background whatever the request are left
   * out: the outbox worker's delivery state (a refused request must still not queue mail, so outbox rows count)
   * and a session's last activity (written at most once a minute by any signed-in request). Derived caches
   * (DERIVED_TABLES) are left out too.
   */
  async checksum(): Promise<string> {
    const hash = createHash("sha256");
    const tables = await this.app.query<{ name: string }>(
      "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name",
    );
    for (const { name } of tables) {
      if (DERIVED_TABLES.has(name)) continue;
      const skip = BACKGROUND_COLUMNS[name];
      const columns = (await this.app.query<{ name: string }>(`PRAGMA table_info("${name}")`))
        .map((c) => c.name)
        .filter((c) => !skip || (skip === "all but id" ? c === "id" : !skip.includes(c)));
      const [row] = await this.app.query<{ j: string | null }>(
        `SELECT json_group_array(json_array(${columns.map((c) => `"${c}"`).join(", ")})) AS j ` +
          `FROM (SELECT * FROM "${name}" ORDER BY rowid)`,
      );
      hash.update(`${name}:${row.j ?? ""}\n`);
    }
    return hash.digest("hex");
  }

  private cached: { version: number; sum: string } | null = null;

  /**
   * The same checksum, recomputed only when some other connection has committed since the last one: SQLite's
   * `PRAGMA data_version` changes exactly then (https://sqlite.org/pragma.html#pragma_data_version), so an
   * unchanged value proves the tables are unchanged. The test's queries share one connection, which it needs.
   */
  async tablesChecksum(): Promise<string> {
    const [{ data_version: version }] = await this.app.query<{ data_version: number }>("PRAGMA data_version");
    if (this.cached?.version !== version) this.cached = { version, sum: await this.checksum() };
    return this.cached.sum;
  }
}
