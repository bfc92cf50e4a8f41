// Bad files for every upload kind of the speed lab, through the real handlers over a temp SQLite file
// (lib/speed/README.md §5, §9): empty, wrong columns, text in a number column, printable noise, 10 MB of noise
// and, for traces, too slow a sampling rate. Each is a 400 whose message says what is wrong; nothing is saved.
import { describe, expect, it } from "vitest";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const timing = await import("@/app/api/teams/[teamId]/speed/timing-uploads/route");
const measure = await import("@/app/api/teams/[teamId]/speed/measure-uploads/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const DAY = "2026-11-18";

type Kind = "timing" | "trace" | "force" | "contacts";
function send(kind: Kind, content: string) {
  const body =
    kind === "timing"
      ? { fileName: "bad.csv", content }
      : { kind, fileName: "bad.csv", content, athleteId: ada, testDate: DAY, bodyMassKg: 75 };
  const handler = kind === "timing" ? timing : measure;
  const req = new Request(`http://localhost/api/teams/${a.teamId}/speed/x`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  return handler.POST(req, { params: Promise.resolve({ teamId: String(a.teamId) }) });
}
const counts = () => Promise.all([d.SpeedUpload.count(), d.SpeedTest.count(), d.SpeedProfileEntry.count()]);

/** Printable noise (a Lehmer generator, so each run sends the same bytes). */
function noise(bytes: number, seed: number) {
  return Array.from({ length: bytes }, () =>
    String.fromCharCode(32 + ((seed = (seed * 48271) % 2147483647) % 95)),
  ).join("");
}

const HEADER: Record<Kind, string> = {
  timing: "athlete,date,trial,start,distance_m,time_s,body_mass_kg",
  trace: "time_s,speed_ms",
  force: "time_s,force_n",
  contacts: "contact_time_s,flight_time_s,step_length_m",
};
/** A file of the kind with one number cell replaced by text, and where the 400 says it is. */
const TEXT_IN_NUMBERS: Record<Kind, { content: string; field: string; message: string }> = {
  timing: {
    content: `${HEADER.timing}\nAda Athlete,${DAY},1,standing,10,fast,`,
    field: "line 2 time_s",
    message: 'time_s is not a number: "fast"',
  },
  trace: {
    content: `${HEADER.trace}\n0,0\n0.05,1.2\n0.1,quick`,
    field: "line 4 speed_ms",
    message: 'speed_ms is not a number: "quick"',
  },
  force: {
    content: `${HEADER.force}\n0,0\n0.001,12N`,
    field: "line 3 force_n",
    message: 'force_n is not a number: "12N"',
  },
  contacts: {
    content: `${HEADER.contacts}\n0.1,0.12,2.1\nshort,0.12,2.1`,
    field: "line 3 contact_time_s",
    message: 'contact_time_s is not a number: "short"',
  },
};

async function refusal(kind: Kind, content: string) {
  const before = await counts();
  const res = await send(kind, content);
  expect(res.status).toBe(400);
  const { error } = (await res.json()) as { error: { message: string; fields: Record<string, string[]> } };
  expect(await counts()).toEqual(before);
  return error;
}

describe.each(["timing", "trace", "force", "contacts"] as const)(
  "bad %s files: a 400 naming the problem, nothing saved",
  (kind) => {
    it("empty", async () => {
      who.userId = a.users.coach.userId;
      expect((await refusal(kind, "")).message).toBe("The file is empty. Nothing was saved.");
      expect((await refusal(kind, " \n\n")).message).toBe("The file is empty. Nothing was saved.");
    });

    it("a header with no rows", async () => {
      who.userId = a.users.coach.userId;
      expect((await refusal(kind, `${HEADER[kind]}\n`)).message).toBe(
        "The file has a header but no rows. Nothing was saved.",
      );
    });

    it("wrong columns: the missing and unknown ones are named, with the expected header", async () => {
      who.userId = a.users.coach.userId;
      const error = await refusal(kind, "name,seconds\nAda,1.9\n");
      expect(error.message).toMatch(
        /^Wrong columns: missing columns? [a-z_, ]+; unknown columns name, seconds\. Expected /,
      );
      expect(error.message).toContain(HEADER[kind].split(",")[0]);
      expect(error.fields.file).toEqual([error.message.replace(/ Nothing was saved\.$/, "").replace(/\.$/, "")]);
    });

    it("text in a number column: the line and column are named", async () => {
      who.userId = a.users.coach.userId;
      const { content, field, message } = TEXT_IN_NUMBERS[kind];
      const error = await refusal(kind, content);
      expect(error.fields).toEqual({ [field]: [message] });
      expect(error.message).toMatch(/^1 problem in the file \(first on line \d: /);
    });

    it("1 MB of printable noise (under the size limit) is refused for its columns", async () => {
      who.userId = a.users.coach.userId;
      expect((await refusal(kind, noise(1024 * 1024, 5))).message).toMatch(/^Wrong columns: /);
    });

    it("binary noise is refused as not CSV text", async () => {
      who.userId = a.users.coach.userId;
      const binary = Array.from({ length: 4096 }, (_, i) => String.fromCharCode((i * 7919) % 256)).join("");
      expect((await refusal(kind, binary)).message).toBe(
        "The file is not CSV text (it contains control characters). Nothing was saved.",
      );
    });

    it("10 MB of noise is refused by its size", async () => {
      who.userId = a.users.coach.userId;
      expect((await refusal(kind, noise(10 * 1024 * 1024, 11))).message).toBe(
        "The file is over 2 MB. Nothing was saved.",
      );
    });
  },
);

describe("traces sampled too slowly", () => {
  it("a speed trace at 2 Hz and a force trace at 100 Hz are refused naming their rate and the least", async () => {
    who.userId = a.users.coach.userId;
    const rows = (hz: number, n: number, value: number) =>
      Array.from({ length: n }, (_, i) => `${(i / hz).toFixed(4)},${value}`).join("\n");
    expect((await refusal("trace", `${HEADER.trace}\n${rows(2, 40, 5)}`)).message).toBe(
      "The speed trace is sampled at 2.0 Hz; at least 10 Hz is needed. Nothing was saved.",
    );
    expect((await refusal("force", `${HEADER.force}\n${rows(100, 400, 700)}`)).message).toBe(
      "The force trace is sampled at 100.0 Hz; at least 500 Hz is needed. Nothing was saved.",
    );
  });
});
