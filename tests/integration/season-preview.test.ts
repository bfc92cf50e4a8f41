// The progression preview the season screen draws before anything is written (lib/season/forecast-preview.ts)
// against the season view the server answers after the write: every cell and warning of every previewed week
// must be the same, for a build and an unload, a regenerated span that replaces earlier drafts, and a taper that
// starts in today's week. The squad is invented history (seedSquad: logs behind, plan ahead) over a temp SQLite file.
import { describe, expect, it } from "vitest";
import { addDays, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import type { SeasonViewDto } from "@/lib/data/season-view";
import type { ProgressionBase } from "@/lib/season/forecast-preview";
import type { ProgressionRule } from "@/lib/season/progression";
import { setupTestDb } from "../helpers/db";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const { seedSquad } = await import("@/lib/seed/seed-squad");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const { previewProgression, withPreview } = await import("@/lib/season/forecast-preview");
const season = await import("@/app/api/teams/[teamId]/season/route");
const progression = await import("@/app/api/teams/[teamId]/season/progression/route");

const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const squad = await seedSquad(d, { name: "Preview Track", athletes: 5, seasons: 1, today });
await rebuildLedger({});
const coach = await d.User.create({
  name: "Preview Coach",
  email: "preview.coach@previewtrack.test",
  passwordHash: null,
});
await d.Membership.create({ teamId: squad.teamId, userId: coach.id, role: "coach" });
const T = String(squad.teamId);
const thisWeek = startOfWeek(today, 1);
const from = shiftWeek(thisWeek, -2);
const WEEKS = 12;
const to = addDays(shiftWeek(from, WEEKS - 1), 6);

const p = <V>(v: V) => ({ params: Promise.resolve(v) });
const get = async <B>(path: string, handler: typeof season.GET) => {
  const res = await handler(new Request(`http://test${path}`), p({ teamId: T }));
  return { status: res.status, body: (await res.json()) as B };
};
const view = async () => (await get<SeasonViewDto>(`/?from=${from}&weeks=${WEEKS}`, season.GET)).body;

/** The cells and warnings of the weeks from `first` on, without the preview mark. */
const shown = (v: SeasonViewDto, first: string) =>
  v.athletes.map((a) => ({
    id: a.id,
    cells: a.cells.filter((c) => c.weekStart >= first).map((c) => ({ ...c, preview: undefined })),
    warnings: a.warnings.filter((w) => w.weekStart >= first),
  }));

async function previewThenWrite(sourceWeek: string, firstWeek: string, weeks: number, rule: ProgressionRule) {
  who.userId = coach.id;
  const base = await get<ProgressionBase>(
    `/?sourceWeek=${sourceWeek}&firstWeek=${firstWeek}&to=${to}`,
    progression.GET,
  );
  expect(base.status).toBe(200);
  const before = await view();
  const preview = withPreview(before, previewProgression(base.body, { weeks, rule }));
  const res = await progression.POST(
    new Request("http://test/", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ sourceWeek, firstWeek, weeks, rule }),
    }),
    p({ teamId: T }),
  );
  expect(res.status).toBe(201);
  const after = await view();
  return { base: base.body, before, preview, after };
}

describe("progression preview against the written weeks", () => {
  it("a build and unload from next week: every previewed cell and warning is the written one", async () => {
    const next = shiftWeek(thisWeek, 1);
    const r = await previewThenWrite(next, shiftWeek(next, 1), 6, {
      kind: "build",
      weeklyIncreasePct: 10,
      buildWeeks: 3,
      unloadPct: 40,
    });
    expect(r.base.athletes.length).toBe(5);
    expect(shown(r.preview, shiftWeek(next, 1))).toEqual(shown(r.after, shiftWeek(next, 1)));
    // The preview changed something, and marked what it changed.
    expect(shown(r.preview, shiftWeek(next, 1))).not.toEqual(shown(r.before, shiftWeek(next, 1)));
    expect(r.preview.athletes[0].cells.some((c) => c.preview)).toBe(true);
  });

  it("generating the same weeks again replaces the drafts, and the preview knows which", async () => {
    const next = shiftWeek(thisWeek, 1);
    const r = await previewThenWrite(next, shiftWeek(next, 1), 6, {
      kind: "build",
      weeklyIncreasePct: 5,
      buildWeeks: 2,
      unloadPct: 30,
    });
    expect(shown(r.preview, shiftWeek(next, 1))).toEqual(shown(r.after, shiftWeek(next, 1)));
  });

  it("a taper written from today's week (days behind today included) previews as written", async () => {
    const r = await previewThenWrite(shiftWeek(thisWeek, -1), thisWeek, 3, {
      kind: "taper",
      reductionPct: 50,
      shape: "exponential",
    });
    expect(shown(r.preview, thisWeek)).toEqual(shown(r.after, thisWeek));
  });

  it("asks for the fields it needs and lets only the team's coaches read it", async () => {
    who.userId = coach.id;
    const bad = await get<{ error: { fields: Record<string, string[]> } }>(
      `/?sourceWeek=${thisWeek}&firstWeek=${thisWeek}&to=nope`,
      progression.GET,
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["to"]));
    who.userId = null;
    const anonymous = await get(
      `/?sourceWeek=${thisWeek}&firstWeek=${shiftWeek(thisWeek, 1)}&to=${to}`,
      progression.GET,
    );
    expect(anonymous.status).toBe(401);
  });
});
