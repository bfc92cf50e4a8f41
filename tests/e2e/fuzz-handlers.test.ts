// Fuzzes every route handler's body and query over real HTTP (fast-check): whatever arrives, the answer is a
// success or a 4xx with a message, never a 5xx, and a refused request leaves every table exactly as it was.
// Each handler starts from the valid request the authorization matrix sends, then one thing is made wrong.
// Bounded for CI: FUZZ_RUNS cases per handler (default 8) from a fixed seed (FUZZ_SEED to explore others).
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { discoverRoutes } from "./authz-discover";
import { setupWorld, type Subject, type World } from "./authz-fixtures";
import { REQUESTS, type Req } from "./authz-requests";
import { startMailApp, type MailApp } from "./notices-app";

const RUNS = Number(process.env.FUZZ_RUNS ?? 8);
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);

/** next-auth's own handler answers redirects and its own pages; it is held to "never 5xx" only. */
const FOREIGN = new Set(["GET /api/auth/[...nextauth]", "POST /api/auth/[...nextauth]"]);
/** Who sends the request: someone allowed to, so that the fuzzed input gets past the permission check. */
const SENDER: Record<string, Subject> = {
  "POST /api/athletes/[athleteId]/restrictions": "physio",
  "PATCH /api/restrictions/[restrictionId]": "physio",
};
/**
 * Handlers with a 5xx the fuzz finds today, each naming the defect and whose area it is in. They run as expected
 * failures, so the suite turns red the day the fix lands: then delete the entry.
 */
const KNOWN_5XX: Record<string, string> = {};

// Values that have broken handlers before, or would: control characters, far dates, huge and odd numbers.
const evilString = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 20 }),
  fc.constantFrom(
    "\u0000",
    "a\u0000b",
    "\r",
    "line\rbreak",
    "\u001b[31m",
    "\u202e",
    "\ud800",
    '=HYPERLINK("http://x")',
    "../../etc/passwd",
    "%00",
    "<script>",
    "' OR 1=1 --",
  ),
  fc.constantFrom(
    "9999-12-31",
    "0000-01-01",
    "2026-02-30",
    "2026-13-01",
    "+275760-09-13",
    "-000001-01-01",
    "2026-1-1",
    "1e3",
    "NaN",
    "Infinity",
    "-0",
    "0x10",
    " 5 ",
  ),
  fc.constantFrom("x".repeat(5000), "é".repeat(3000)),
);
const evilNumber = fc.oneof(
  fc.integer(),
  fc.double(),
  fc.constantFrom(
    0,
    -1,
    1.5,
    1e308,
    -1e308,
    Number.MAX_SAFE_INTEGER,
    Number.MAX_SAFE_INTEGER + 2,
    2 ** 31,
    -(2 ** 31) - 1,
    5e-324,
  ),
);
const evilValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: evilString },
  { weight: 3, arbitrary: evilNumber },
  fc.constantFrom(null, true, false, [], {}, [null], { __proto__: { x: 1 } }, { constructor: { prototype: 1 } }),
  fc.array(fc.oneof(evilString, evilNumber), { maxLength: 4 }),
  fc.jsonValue({ maxDepth: 3 }),
  fc.constant(Array.from({ length: 40 }, () => [[[[[[[[1]]]]]]]])),
);
const rawText = fc.oneof(
  fc.constantFrom("", "null", "[]", "{", '{"a":', "\u0000", "true", "1e999", '{"__proto__":{"a":1}}'),
  fc.string({ maxLength: 60 }),
);
const QUERY_KEYS = ["week", "view", "from", "to", "metric", "status", "athleteId", "limit", "version", "mine"];

type Mutation =
  | { kind: "field"; pathPick: number; value: unknown }
  | { kind: "extra"; key: string; value: unknown }
  | { kind: "body"; value: unknown }
  | { kind: "raw"; text: string }
  | { kind: "query"; key: string; value: string }
  | { kind: "path"; segment: string };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 5, arbitrary: fc.record({ kind: fc.constant("field" as const), pathPick: fc.nat(), value: evilValue }) },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant("extra" as const),
      key: fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("__proto__", "constructor", "id", "teamId")),
      value: evilValue,
    }),
  },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant("body" as const), value: evilValue }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("raw" as const), text: rawText }) },
  {
    weight: 3,
    arbitrary: fc.record({
      kind: fc.constant("query" as const),
      key: fc.constantFrom(...QUERY_KEYS),
      value: evilString,
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant("path" as const),
      segment: fc.oneof(evilString, fc.constantFrom("0", "-1", "1.5", "99999999999999999999", "%2e%2e", "%00")),
    }),
  },
);

/** Every path to a leaf (or a whole array/object) inside a JSON body. */
function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return prefix.length ? [prefix] : [];
  const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
  return [...(prefix.length ? [prefix] : []), ...entries.flatMap(([k, v]) => paths(v, [...prefix, k]))];
}

function setPath(body: unknown, path: (string | number)[], value: unknown): unknown {
  const copy = structuredClone(body) as Record<string | number, unknown>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1]] = value;
  return copy;
}

type Sent = { method: string; path: string; body?: string; json: boolean };

function apply(base: Extract<Req, { kind: "api" }>, m: Mutation): Sent {
  const hasBody = base.body !== undefined;
  const sent: Sent = {
    method: base.method,
    path: base.path,
    body: hasBody ? JSON.stringify(base.body) : undefined,
    json: true,
  };
  switch (m.kind) {
    case "field": {
      const all = paths(base.body);
      if (all.length === 0) return { ...sent, body: JSON.stringify(m.value) };
      return { ...sent, body: JSON.stringify(setPath(base.body, all[m.pathPick % all.length], m.value)) };
    }
    case "extra":
      return {
        ...sent,
        body: JSON.stringify({ ...(typeof base.body === "object" && base.body ? base.body : {}), [m.key]: m.value }),
      };
    case "body":
      return { ...sent, body: JSON.stringify(m.value) ?? "null" };
    case "raw":
      return { ...sent, body: m.text };
    case "query": {
      const url = new URL(base.path, "http://x");
      url.searchParams.set(m.key, m.value);
      return { ...sent, path: url.pathname + url.search };
    }
    case "path": {
      // Replace the last numeric id (or token) in the path with something that is not one.
      const parts = base.path.split("?")[0].split("/");
      const i = parts.findLastIndex((p) => /^\d+$/.test(p) || p.length > 30);
      if (i < 0) return sent;
      parts[i] = encodeURIComponent(m.segment) || "%20";
      return { ...sent, path: parts.join("/") + (base.path.includes("?") ? `?${base.path.split("?")[1]}` : "") };
    }
  }
}

/** Run first for every handler, whatever the seed: inputs that broke handlers in this issue or easily could. */
const EXAMPLES: [Mutation][] = [
  [{ kind: "raw", text: '{"a":' }],
  [{ kind: "field", pathPick: 0, value: "a\u0000b" }],
  [{ kind: "field", pathPick: 1, value: "9999-12-31" }],
  [{ kind: "query", key: "week", value: "9999-12-31" }],
  [{ kind: "path", segment: "99999999999999999999" }],
];

/** Each handler gets its own stream of cases from the one seed (the same seed everywhere repeats one sequence). */
function seedFor(key: string): number {
  let h = SEED | 0;
  for (const ch of key) h = (Math.imul(h, 31) + ch.charCodeAt(0)) | 0;
  return h;
}

const routes = discoverRoutes();

describe("fuzzed bodies and queries: 4xx with a message, never 5xx, nothing changed on refusal", () => {
  let app: MailApp;
  let world: World;

  beforeAll(async () => {
    app = await startMailApp();
    world = await setupWorld(app);
  });
  afterAll(async () => {
    await app?.stop();
  });

  for (const { key } of routes) {
    const known = KNOWN_5XX[key];
    const test = known ? it.fails : it;
    test(`${key}${known ? ` (known defect: ${known})` : ""}`, { timeout: 120_000 }, async () => {
      const subject = SENDER[key] ?? "head";
      let base: Req | null = null;
      // The checksum after a refusal is the one before the next request (nothing changed in between).
      let before: string | null = null;
      await fc.assert(
        fc.asyncProperty(mutation, async (m) => {
          // A fresh valid request whenever the last one may have been spent (a 2xx delete, say).
          base ??= await REQUESTS[key](world, subject);
          if (base.kind !== "api") throw new Error(`${key} is not a handler request`);
          const sent = apply(base, m);
          before ??= await world.tablesChecksum();
          const res = await world.clients[subject].fetch(sent.path, {
            method: sent.method,
            body: sent.method === "GET" || sent.method === "HEAD" ? undefined : sent.body,
            headers: { origin: app.url, ...(sent.body !== undefined ? { "content-type": "application/json" } : {}) },
          });
          const text = await res.text();
          const sentText = `${sent.method} ${sent.path.slice(0, 200)} ${String(sent.body).slice(0, 300)}`;
          const what = `${sentText} → ${res.status} ${text.slice(0, 300)}`;
          expect(res.status, what).toBeLessThan(500);
          if (FOREIGN.has(key) || res.status < 400) {
            // A success may have spent the target and changed the tables: start again from fresh ones.
            base = null;
            before = null;
            return;
          }
          // Node's HTTP parser refuses an oversized request line or headers (431/414) before the app sees it.
          if (res.status === 431 || res.status === 414) return;
          let error: { message?: unknown } | undefined;
          try {
            error = (JSON.parse(text) as { error?: { message?: unknown } }).error;
          } catch {
            throw new Error(`a refusal that is not JSON: ${what}`);
          }
          expect(typeof error?.message === "string" && error.message.length > 0, `no message: ${what}`).toBe(true);
          expect(await world.tablesChecksum(), `a refused request changed the database: ${what}`).toBe(before);
        }),
        { numRuns: RUNS, seed: seedFor(key), endOnFailure: true, examples: EXAMPLES },
      );
    });
  }
});
