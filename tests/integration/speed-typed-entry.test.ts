// Tests typed in on the speed lab's forms take the upload's path (lib/speed/README.md §5, §9): the form sends the
// canonical CSV of what was typed, which the handlers check like any file and keep as the original.
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { contactRowsCsv, timingTrialCsv, typedFieldOf } from "@/lib/speed/typed-entry";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";
import { T4_GATES } from "../unit/speed/fixtures";

const d = await setupTestDb();
const timing = await import("@/app/api/teams/[teamId]/speed/timing-uploads/route");
const measure = await import("@/app/api/teams/[teamId]/speed/measure-uploads/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const DAY = "2026-11-18";

function post(handler: typeof timing, body: unknown) {
  const req = new Request(`http://localhost/api/teams/${a.teamId}/speed/x`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  return handler.POST(req, { params: Promise.resolve({ teamId: String(a.teamId) }) });
}
const counts = () => Promise.all([d.SpeedUpload.count(), d.SpeedTest.count()]);

describe("typed-in tests", () => {
  it("a typed timing trial (T4 splits) is kept as its canonical CSV and fitted to vmax 9.5 m/s, τ 1.1 s", async () => {
    who.userId = a.users.coach.userId;
    const content = timingTrialCsv({
      athleteName: "Ada Athlete",
      testDate: DAY,
      startType: "standing",
      bodyMassKg: null,
      gates: T4_GATES.slice(1),
    });
    const res = await post(timing, { fileName: `typed-in-${DAY}.csv`, content });
    expect(res.status).toBe(201);
    const { testIds, uploadId } = (await res.json()) as { testIds: number[]; uploadId: number };
    const file = (await d.SpeedUpload.findByPk(uploadId, { raw: true }))!;
    expect(file).toMatchObject({ content, kind: "timing", sha256: createHash("sha256").update(content).digest("hex") });
    const test = (await d.SpeedTest.findByPk(testIds[0], { raw: true }))!;
    expect(test).toMatchObject({ athleteId: ada, testDate: DAY, startType: "standing", bodyMassKg: 60 });
    const fit = JSON.parse(test.result).fit;
    // lib/speed/README.md §2 T4: recovered to 1e-3.
    expect(Math.abs(fit.vmax - 9.5)).toBeLessThan(1e-3);
    expect(Math.abs(fit.tau - 1.1)).toBeLessThan(1e-3);
  });

  it("a typed trial the server refuses (a date ahead) names the form's field; nothing is saved", async () => {
    who.userId = a.users.coach.userId;
    const before = await counts();
    const content = timingTrialCsv({
      athleteName: "Ada Athlete",
      testDate: "2999-01-01",
      startType: "blocks",
      gates: T4_GATES.slice(1),
    });
    const res = await post(timing, { fileName: "typed-in.csv", content });
    expect(res.status).toBe(400);
    const { error } = (await res.json()) as { error: { fields: Record<string, string[]> } };
    const placed = Object.keys(error.fields).map((k) => typedFieldOf("timing", k));
    expect(placed).toEqual(["testDate"]);
    expect(await counts()).toEqual(before);
  });

  it("typed contact rows (B1: 0.086 s contact, 0.145 s flight) are kept as CSV and give 4.329 Hz and 2.686 BW", async () => {
    who.userId = a.users.coach.userId;
    const content = contactRowsCsv([
      { contactTimeS: 0.086, flightTimeS: 0.145, stepLengthM: 2.3 },
      { contactTimeS: 0.086, flightTimeS: 0.145, stepLengthM: null },
    ]);
    const res = await post(measure, {
      kind: "contacts",
      fileName: `typed-in-contacts-${DAY}.csv`,
      content,
      athleteId: ada,
      testDate: DAY,
      plannedSessionId: null,
      bodyMassKg: null,
    });
    expect(res.status).toBe(201);
    const { testId, uploadId } = (await res.json()) as { testId: number; uploadId: number };
    expect((await d.SpeedUpload.findByPk(uploadId, { raw: true }))!.content).toBe(content);
    const r = JSON.parse((await d.SpeedTest.findByPk(testId, { raw: true }))!.result);
    // lib/speed/README.md §7 B1/B2 [C].
    expect(r.means.stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(r.means.stanceForceBw).toBeCloseTo(2.686, 3);
    expect(r.means.stepLengthM).toBe(2.3);
  });

  it("typed contact rows out of the file's bounds come back by row and field; nothing is saved", async () => {
    who.userId = a.users.coach.userId;
    const before = await counts();
    const content = contactRowsCsv([
      { contactTimeS: 0.1, flightTimeS: 0.12 },
      { contactTimeS: 0.1, flightTimeS: 3 },
    ]);
    const res = await post(measure, { kind: "contacts", fileName: "t.csv", content, athleteId: ada, testDate: DAY });
    expect(res.status).toBe(400);
    const { error } = (await res.json()) as { error: { fields: Record<string, string[]> } };
    expect(error.fields).toEqual({ "line 3 flight_time_s": ["flight_time_s must be 0–2"] });
    expect(typedFieldOf("contacts", "line 3 flight_time_s")).toBe("rows.1.flightTimeS");
    expect(await counts()).toEqual(before);
  });
});
