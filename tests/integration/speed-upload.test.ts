// The timing-gate CSV upload and the accept handler, run for real over a temp SQLite file (lib/speed/README.md
// §5): a clean file is kept as it came with one test per trial; any problem is a 400 naming it and saves nothing.
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const upload = await import("@/app/api/teams/[teamId]/speed/timing-uploads/route");
const accept = await import("@/app/api/teams/[teamId]/speed/tests/[testId]/accept/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const coach = a.users.coach;
const HEAD = "athlete,date,trial,start,distance_m,time_s,body_mass_kg";
// T4 splits (lib/speed/README.md §1 [C]): vmax 9.5 m/s, τ 1.1 s.
const GOOD = [
  HEAD,
  ...["0,0", "10,1.969", "20,3.142", "30,4.2345", "40,5.3017"].map((g) => `Ada Athlete,2026-11-18,1,standing,${g},`),
].join("\n");

const ctx = (teamId: number) => ({ params: Promise.resolve({ teamId: String(teamId) }) });
function post(teamId: number, body: unknown, raw = false) {
  const req = new Request(`http://localhost/api/teams/${teamId}/speed/timing-uploads`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: raw ? (body as string) : JSON.stringify(body),
  });
  return upload.POST(req, ctx(teamId));
}
async function counts() {
  return Promise.all([d.SpeedUpload.count(), d.SpeedTest.count(), d.SpeedProfileEntry.count()]);
}
async function refused(res: Response) {
  expect(res.status).toBe(400);
  return ((await res.json()) as { error: { message: string; fields: Record<string, string[]> } }).error;
}

describe("timing CSV upload", () => {
  it("keeps the file as it came and saves one test per trial with its fit", async () => {
    who.userId = coach.userId;
    const res = await post(a.teamId, { fileName: "gates.csv", content: GOOD });
    expect(res.status).toBe(201);
    const body = (await res.json()) as { testIds: number[]; uploadId: number };
    expect(body.testIds).toHaveLength(1);
    const file = (await d.SpeedUpload.findByPk(body.uploadId, { raw: true }))!;
    expect(file.content).toBe(GOOD);
    expect(file.sha256).toBe(createHash("sha256").update(GOOD).digest("hex"));
    expect(file.uploadedByUserId).toBe(coach.userId);
    const test = (await d.SpeedTest.findByPk(body.testIds[0], { raw: true }))!;
    expect(test).toMatchObject({
      athleteId: a.users["ada@alphatrack.test"].athleteId,
      testDate: "2026-11-18",
      uploadId: body.uploadId,
    });
    expect(Math.abs(JSON.parse(test.result).fit.vmax - 9.5)).toBeLessThan(1e-3);
  });

  it("row problems: a 400 naming each line, nothing saved", async () => {
    who.userId = coach.userId;
    const before = await counts();
    const content = [
      HEAD,
      "Ada Athlete,2026-11-18,1,standing,10,1.969,",
      "Ada Athlete,2026-11-18,1,standing,20,1.2,",
      "Somebody Else,2026-11-18,1,standing,10,1.9,",
      "Ben Athlete,2026-11-18,1,standing,,1.9,",
      "Ben Athlete,2026-11-18,1,standing,20,three,",
    ].join("\n");
    const error = await refused(await post(a.teamId, { fileName: "bad.csv", content }));
    expect(error.message).toMatch(/^4 problems in the file \(first on line 3: Times go backwards/);
    expect(Object.keys(error.fields)).toEqual([
      "line 3 time_s",
      "line 4 athlete",
      "line 5 distance_m",
      "line 6 time_s",
    ]);
    expect(await counts()).toEqual(before);
  });

  it("an athlete of another team is an unknown athlete; a date in the future is named", async () => {
    who.userId = coach.userId;
    const before = await counts();
    const other = GOOD.replace(/Ada Athlete/g, "Ada Athlete").replace(
      /^Ada Athlete,2026-11-18/m,
      "Ada Athlete,2999-01-01",
    );
    const error = await refused(await post(a.teamId, { fileName: "future.csv", content: other }));
    expect(error.fields["line 2 date"]).toBeDefined();
    const bravo = GOOD.replace(/Ada Athlete/g, "Bravo Person");
    expect(
      (await refused(await post(a.teamId, { fileName: "x.csv", content: bravo }))).fields["line 2 athlete"],
    ).toEqual(['Unknown athlete "Bravo Person"']);
    expect(await counts()).toEqual(before);
  });

  it("bad files: empty, wrong columns, 10 MB of noise, not JSON: a clear 400, nothing saved", async () => {
    who.userId = coach.userId;
    const before = await counts();
    expect((await refused(await post(a.teamId, { fileName: "e.csv", content: "" }))).message).toBe(
      "The file is empty. Nothing was saved.",
    );
    expect(
      (await refused(await post(a.teamId, { fileName: "w.csv", content: "name,seconds\nAda,1.9" }))).message,
    ).toMatch(/^Wrong columns: missing columns athlete, date, start, distance_m, time_s/);
    let seed = 7;
    const noise = Array.from({ length: 10 * 1024 * 1024 }, () =>
      String.fromCharCode(32 + ((seed = (seed * 48271) % 2147483647) % 95)),
    ).join("");
    expect((await refused(await post(a.teamId, { fileName: "n.csv", content: noise }))).message).toBe(
      "The file is over 2 MB. Nothing was saved.",
    );
    expect((await refused(await post(a.teamId, "not json", true))).message).toBe("The request body must be JSON");
    expect(await counts()).toEqual(before);
  });

  it("who may upload: coaches of the team; a physio 403, another team's head coach 404", async () => {
    who.userId = a.users.physio.userId;
    expect((await post(a.teamId, { fileName: "g.csv", content: GOOD })).status).toBe(403);
    who.userId = b.users.head_coach.userId;
    expect((await post(a.teamId, { fileName: "g.csv", content: GOOD })).status).toBe(404);
  });
});

describe("accept handler", () => {
  it("accepts a test of the team once (200, then 409); another team's head coach gets 404", async () => {
    const [test] = await d.SpeedTest.findAll({ where: { teamId: a.teamId }, raw: true });
    const call = () =>
      accept.POST(new Request("http://localhost/x", { method: "POST" }), {
        params: Promise.resolve({ teamId: String(a.teamId), testId: String(test.id) }),
      });
    who.userId = b.users.head_coach.userId;
    expect((await call()).status).toBe(404);
    who.userId = coach.userId;
    const res = await call();
    expect(res.status).toBe(200);
    expect(((await res.json()) as { effectiveFrom: string }).effectiveFrom).toBe("2026-11-18");
    expect((await call()).status).toBe(409);
    const ada = (await d.Athlete.findByPk(test.athleteId, { raw: true }))!;
    expect(ada.vmaxMs).toBeCloseTo(9.5, 2);
  });
});
