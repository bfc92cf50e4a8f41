// Speed traces, force traces and contact measurements uploaded through their handler over a temp SQLite file
// (lib/speed/README.md §8, §9): a clean file is kept with one test; a speed trace attached to a planned session
// is shown against the session's planned figures; bad files are a 400 naming what is wrong, with nothing saved.
import { describe, expect, it } from "vitest";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const upload = await import("@/app/api/teams/[teamId]/speed/measure-uploads/route");
const accept = await import("@/app/api/teams/[teamId]/speed/tests/[testId]/accept/route");
const { getAthleteSpeed } = await import("@/lib/data/speed-views");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const coach = a.users.coach;
const ada = a.users["ada@alphatrack.test"].athleteId!; // vmax 9.5 m/s, 60 kg (tests/helpers/fixtures.ts)
const ben = a.users["ben@alphatrack.test"].athleteId!;
const DAY = "2026-11-18";

const session = await d.PlannedSession.create({
  teamId: a.teamId,
  athleteId: ada,
  date: DAY,
  startTime: "17:00",
  durationMin: 45,
  title: "Flying 30s",
  plannedRpe: 6,
  status: "published",
  notes: null,
  publishedAt: new Date(),
});
await d.SessionBlock.create({
  sessionId: session.id,
  templateId: null,
  position: 0,
  kind: "max_velocity",
  title: "Flying 30",
  running: { sets: 1, reps: 3, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
});

const ctx = (teamId: number) => ({ params: Promise.resolve({ teamId: String(teamId) }) });
function post(teamId: number, body: unknown) {
  const req = new Request(`http://localhost/api/teams/${teamId}/speed/measure-uploads`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  return upload.POST(req, ctx(teamId));
}
const counts = () => Promise.all([d.SpeedUpload.count(), d.SpeedTest.count()]);
async function refused(res: Response) {
  expect(res.status).toBe(400);
  return ((await res.json()) as { error: { message: string; fields: Record<string, string[]> } }).error;
}
const csv = (header: string, rows: (number | string)[][]) => [header, ...rows.map((r) => r.join(","))].join("\n");

/** 12 s at `hz`: standing 1 s, then the sprint model 9.5 m/s, τ 1.1 s (lib/speed/README.md T4) for 6 s, then 4 m/s. */
function sprintTrace(hz: number) {
  const rows: number[][] = [];
  for (let i = 0; i <= 12 * hz; i++) {
    const t = i / hz;
    const v = t < 1 ? 0 : t < 7 ? 9.5 * (1 - Math.exp(-(t - 1) / 1.1)) : 4;
    rows.push([Number(t.toFixed(4)), Number(v.toFixed(4))]);
  }
  return csv("time_s,speed_ms", rows);
}

describe("speed traces", () => {
  it("a 50 Hz trace of a planned session: vmax, τ, the athlete's bands, and measured next to planned", async () => {
    who.userId = coach.userId;
    const content = sprintTrace(50);
    const res = await post(a.teamId, {
      kind: "trace",
      fileName: "radar.csv",
      content,
      athleteId: ada,
      testDate: DAY,
      plannedSessionId: session.id,
    });
    expect(res.status).toBe(201);
    const { testId, uploadId } = (await res.json()) as { testId: number; uploadId: number };
    expect((await d.SpeedUpload.findByPk(uploadId, { raw: true }))!.content).toBe(content);
    const test = (await d.SpeedTest.findByPk(testId, { raw: true }))!;
    expect(test).toMatchObject({ kind: "trace", plannedSessionId: session.id, testDate: DAY });
    const r = JSON.parse(test.result);
    expect(r.samplingHz).toBeCloseTo(50, 6);
    expect(Math.abs(r.fit.tau - 1.1)).toBeLessThan(5e-3); // speeds rounded to 0.1 mm/s
    expect(Math.abs(r.fit.vmax - 9.5)).toBeLessThan(5e-3);
    // Model speed 6 s in: 9.5·(1 − e^(−6/1.1)) = 9.4593 m/s; the 0.5 s average just before it sits a little lower.
    expect(r.vmaxMs).toBeGreaterThan(9.43);
    expect(r.vmaxMs).toBeLessThan(9.4593);
    // Near-max: ≥ 90 % of Ada's 9.5 m/s = 8.55 m/s, reached 1.1·ln(10) = 2.533 s into the run.
    expect(r.nearMaxM).toBeGreaterThan(0);
    expect(r.hsrM).toBeGreaterThan(r.nearMaxM);

    const view = await getAthleteSpeed({ teamId: a.teamId, athleteId: ada });
    expect(view.measured).toHaveLength(1);
    const m = view.measured[0];
    expect(m).toMatchObject({ sessionId: session.id, title: "Flying 30s", date: DAY });
    expect(m.measured.hsrM).toBeCloseTo(r.hsrM, 9);
    // Planned: 3 × (20 m run-in + 30 m flying) = 150 m run; the engine's HSR and near-max figures are in it.
    expect(m.planned.runM).toBeCloseTo(150, 9);
    expect(m.planned.hsrM).toBeGreaterThan(80);
    expect(m.planned.hsrM).toBeLessThanOrEqual(150);
    expect(m.planned.nearMaxM).toBeGreaterThan(0);
  });

  it("a trace at 2 Hz is refused naming its rate; nothing is saved", async () => {
    who.userId = coach.userId;
    const before = await counts();
    const error = await refused(
      await post(a.teamId, {
        kind: "trace",
        fileName: "slow.csv",
        content: sprintTrace(2),
        athleteId: ada,
        testDate: DAY,
      }),
    );
    expect(error.message).toBe("The speed trace is sampled at 2.0 Hz; at least 10 Hz is needed. Nothing was saved.");
    expect(await counts()).toEqual(before);
  });

  it("a session that is not the athlete's, or on another day, is named; so is an athlete of another team", async () => {
    who.userId = coach.userId;
    const before = await counts();
    const base = { kind: "trace", fileName: "r.csv", content: sprintTrace(20), testDate: DAY };
    expect(
      (await refused(await post(a.teamId, { ...base, athleteId: ben, plannedSessionId: session.id }))).fields,
    ).toHaveProperty("plannedSessionId");
    expect(
      (
        await refused(
          await post(a.teamId, { ...base, testDate: "2026-11-17", athleteId: ada, plannedSessionId: session.id }),
        )
      ).fields,
    ).toHaveProperty("testDate");
    const bravo = b.users["ada@bravotrack.test"].athleteId!;
    expect((await refused(await post(a.teamId, { ...base, athleteId: bravo }))).fields).toHaveProperty("athleteId");
    expect(await counts()).toEqual(before);
  });
});

describe("bad files", () => {
  it("empty, wrong columns, text in numbers, times going backwards, 10 MB of noise: a clear 400, nothing saved", async () => {
    who.userId = coach.userId;
    const before = await counts();
    const send = (kind: string, content: string) =>
      post(a.teamId, { kind, fileName: "bad.csv", content, athleteId: ada, testDate: DAY });
    expect((await refused(await send("trace", ""))).message).toBe("The file is empty. Nothing was saved.");
    expect((await refused(await send("force", "t,f\n0,1"))).message).toMatch(
      /^Wrong columns: missing columns time_s, force_n; unknown columns t, f\. Expected time_s,force_n/,
    );
    const text = await refused(await send("contacts", "contact_time_s,flight_time_s\n0.1,0.12\n0.1,fast\n"));
    expect(text.fields).toEqual({ "line 3 flight_time_s": ['flight_time_s is not a number: "fast"'] });
    const back = await refused(await send("trace", "time_s,speed_ms\n0,1\n0.1,2\n0.05,3\n"));
    expect(Object.keys(back.fields)).toEqual(["line 4 time_s"]);
    let seed = 11;
    const noise = Array.from({ length: 10 * 1024 * 1024 }, () =>
      String.fromCharCode(32 + ((seed = (seed * 48271) % 2147483647) % 95)),
    ).join("");
    expect((await refused(await send("force", noise))).message).toBe("The file is over 2 MB. Nothing was saved.");
    expect((await refused(await send("shoes", "x"))).fields).toHaveProperty("kind");
    expect(await counts()).toEqual(before);
  });
});

describe("force traces and contact measurements", () => {
  it("a 1000 Hz force trace of half-sine contacts 0.10 s long, 0.12 s apart: per contact and mean (§7, B2)", async () => {
    who.userId = coach.userId;
    const mass = 75;
    const bw = mass * 9.81;
    // Mean stance force over a step must be step ÷ contact = 2.2 BW; a half-sine's peak is π/2 × its mean.
    const peak = (Math.PI / 2) * 2.2 * bw;
    const rows: number[][] = [];
    for (let i = 0; i <= 1000; i++) {
      const t = i / 1000;
      const phase = (t - 0.05) % 0.22;
      const f = t >= 0.05 && phase < 0.1 ? peak * Math.sin((Math.PI * phase) / 0.1) : 0;
      rows.push([Number(t.toFixed(3)), Number(f.toFixed(3))]);
    }
    const res = await post(a.teamId, {
      kind: "force",
      fileName: "plate.csv",
      content: csv("time_s,force_n", rows),
      athleteId: ada,
      testDate: DAY,
      bodyMassKg: mass,
    });
    expect(res.status).toBe(201);
    const { testId } = (await res.json()) as { testId: number };
    const r = JSON.parse((await d.SpeedTest.findByPk(testId, { raw: true }))!.result);
    expect(r.mode).toBe("contacts");
    expect(r.contacts.length).toBeGreaterThanOrEqual(3);
    // Common practice (no source): top-speed contacts of about 0.08–0.12 s with peaks of two to three or more BW.
    expect(r.means.contactTimeS).toBeGreaterThan(0.08);
    expect(r.means.contactTimeS).toBeLessThan(0.12);
    expect(r.means.peakBw).toBeGreaterThan(3);
    expect(r.means.stepFrequencyHz).toBeCloseTo(1 / 0.22, 1);
    // Half-sine impulse 2·P·t/π over the threshold-timed contact (lib/speed/README.md §7); mean ≈ 2.2 BW.
    expect(r.means.impulseNs).toBeCloseTo((2 * peak * 0.1) / Math.PI, 0);
    expect(r.means.meanBw).toBeGreaterThan(2.1);
    expect(r.means.impliedStanceBw).toBeGreaterThan(2.1);
  });

  it("a jump from quiet standing: take-off velocity and height by impulse–momentum and by flight time (B6)", async () => {
    who.userId = coach.userId;
    // B6 (lib/speed/README.md §7): 75 kg, 1500 N for 0.25 s from standing → 2.5475 m/s, 0.330772 m; the flight
    // that velocity gives, 2v/g = 0.519368 s, lands at the same height.
    const mass = 75;
    const bw = mass * 9.81;
    const flight = (2 * 2.5475) / 9.81;
    const rows: number[][] = [];
    for (let i = 0; i <= 2000; i++) {
      const t = i / 1000;
      const f = t <= 0.5 ? bw : t <= 0.75 ? 1500 : t < 0.75 + flight ? 0 : bw;
      rows.push([Number(t.toFixed(3)), Number(f.toFixed(3))]);
    }
    const res = await post(a.teamId, {
      kind: "force",
      fileName: "jump.csv",
      content: csv("time_s,force_n", rows),
      athleteId: ada,
      testDate: DAY,
      bodyMassKg: mass,
    });
    expect(res.status).toBe(201);
    const { testId } = (await res.json()) as { testId: number };
    const r = JSON.parse((await d.SpeedTest.findByPk(testId, { raw: true }))!.result);
    expect(r.mode).toBe("jump");
    // One 1 ms sample at each edge moves the figures by well under a percent.
    expect(r.jump.takeOffVelocityMs).toBeCloseTo(2.5475, 2);
    expect(r.jump.heightByImpulseM).toBeCloseTo(0.330772, 2);
    expect(r.jump.heightByFlightTimeM).toBeCloseTo(0.330772, 2);
  });

  it("contact-mat rows: per contact and mean; 0.086 s contact and 0.145 s flight give 4.329 Hz and 2.686 BW (B1/B2)", async () => {
    who.userId = coach.userId;
    const content = csv("contact_time_s,flight_time_s,step_length_m", [
      [0.086, 0.145, 2.3],
      [0.086, 0.145, ""],
    ]);
    const res = await post(a.teamId, { kind: "contacts", fileName: "mat.csv", content, athleteId: ada, testDate: DAY });
    expect(res.status).toBe(201);
    const { testId } = (await res.json()) as { testId: number };
    const r = JSON.parse((await d.SpeedTest.findByPk(testId, { raw: true }))!.result);
    expect(r.means.stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(r.means.stanceForceBw).toBeCloseTo(2.686, 3);
    expect(r.means.stepLengthM).toBe(2.3);
    expect(r.rows[1].stanceForceBw).toBeCloseTo(2.686, 3);
  });

  it("accepting results: contact rows set step frequency, contact time, stance force and step length from their date on", async () => {
    who.userId = coach.userId;
    const acceptTest = (testId: number) =>
      accept.POST(new Request("http://localhost/x", { method: "POST" }), {
        params: Promise.resolve({ teamId: String(a.teamId), testId: String(testId) }),
      });
    const mat = csv("contact_time_s,flight_time_s,step_length_m", [[0.086, 0.145, 2.3]]);
    const up = await post(a.teamId, {
      kind: "contacts",
      fileName: "m.csv",
      content: mat,
      athleteId: ben,
      testDate: DAY,
    });
    const { testId } = (await up.json()) as { testId: number };
    const res = await acceptTest(testId);
    expect(res.status).toBe(200);
    const { values } = (await res.json()) as { values: Record<string, number | null> };
    // B1/B2 (lib/speed/README.md §7); vmax and τ carry on from the hand-typed profile (9.5 m/s, 1.15 s).
    expect(values.stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(values.contactTimeS).toBeCloseTo(0.086, 12);
    expect(values.stanceForceBw).toBeCloseTo(2.686, 3);
    expect(values.stepLengthM).toBe(2.3);
    expect([values.vmaxMs, values.tauS]).toEqual([9.5, 1.15]);
    expect((await d.Athlete.findByPk(ben, { raw: true }))!.stepLengthM).toBe(2.3);

    // A speed trace gives its smoothed vmax and fitted τ; a jump has nothing to accept.
    const tr = await post(a.teamId, {
      kind: "trace",
      fileName: "t.csv",
      content: sprintTrace(20),
      athleteId: ben,
      testDate: "2026-11-20",
    });
    const trace = (await tr.json()) as { testId: number };
    const taken = (await (await acceptTest(trace.testId)).json()) as { values: Record<string, number | null> };
    const stored = JSON.parse((await d.SpeedTest.findByPk(trace.testId, { raw: true }))!.result);
    expect(taken.values.vmaxMs).toBe(stored.vmaxMs);
    expect(taken.values.tauS).toBe(stored.fit.tau);
    expect(taken.values.stepFrequencyHz).toBeCloseTo(4.329, 3); // carried on from the contact rows
  });

  it("who may upload: coaches of the team; a physio 403, another team's head coach 404", async () => {
    const body = {
      kind: "contacts",
      fileName: "m.csv",
      content: "contact_time_s,flight_time_s\n0.1,0.12",
      athleteId: ada,
      testDate: DAY,
    };
    who.userId = a.users.physio.userId;
    expect((await post(a.teamId, body)).status).toBe(403);
    who.userId = b.users.head_coach.userId;
    expect((await post(a.teamId, body)).status).toBe(404);
  });
});
