// Authorization matrix over real HTTP against `next start` (demo club + another team): every route handler and
// method, every page and every server action, as each kind of caller. Expected answers: authz-expected.ts.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_ATHLETES, DEMO_TEAM } from "@/lib/seed/demo-club";
import { discoverActions, discoverPages, discoverRoutes } from "./authz-discover";
import { actionRefs, call } from "./authz-call";
import { EXPECTED, KNOWN_DEFECTS, TABLE_KEYS } from "./authz-expected";
import { SUBJECTS, setupWorld, type World } from "./authz-fixtures";
import { REQUESTS } from "./authz-requests";
import { startMailApp, type MailApp } from "./notices-app";

const discovered = [...discoverRoutes(), ...discoverPages(), ...discoverActions()].map((e) => e.key);

describe("authorization matrix: coverage", () => {
  it("has a row for every handler method, page and server action in the tree, and none for what is gone", () => {
    expect({
      missing: discovered.filter((k) => !(k in EXPECTED)),
      stale: TABLE_KEYS.filter((k) => !discovered.includes(k)),
    }).toEqual({ missing: [], stale: [] });
    expect(new Set(TABLE_KEYS).size).toBe(TABLE_KEYS.length);
  });
  it("knows how to ask every row's question", () => {
    expect(TABLE_KEYS.filter((k) => !REQUESTS[k])).toEqual([]);
  });
});

// Rows where another team's head coach is rightly answered 200, but about their own team or by design.
const LEAK_CHECK_SKIPS = new Set([
  "GET /api/calendar/[token]",
  "GET /api/health",
  "GET /api/auth/[...nextauth]",
  "POST /api/auth/[...nextauth]",
]);
const TEAM_A_WORDS = [DEMO_TEAM.name, "harbourvale", ...DEMO_ATHLETES.map((a) => a.name)];

describe("authorization matrix", () => {
  let app: MailApp;
  let world: World;
  let actions: ReturnType<typeof actionRefs>;

  beforeAll(async () => {
    app = await startMailApp();
    world = await setupWorld(app);
    actions = actionRefs();
  });
  afterAll(async () => {
    await app?.stop();
  });

  for (const key of TABLE_KEYS.filter((k) => discovered.includes(k))) {
    describe(key, () => {
      for (const subject of SUBJECTS) {
        const expected = EXPECTED[key][subject];
        const defect = KNOWN_DEFECTS[key]?.[subject];
        const test = defect ? it.fails : it;
        test(`${subject} → ${expected}${defect ? ` (known defect: ${defect})` : ""}`, async () => {
          const outcome = await call(world, subject, key, await REQUESTS[key](world, subject), actions);
          expect(outcome.status, outcome.body.slice(0, 300)).toBeLessThan(500);
          expect(outcome.answer, `${key} as ${subject}: ${outcome.body.slice(0, 300)}`).toBe(expected);
          const isPublicPage =
            key.startsWith("PAGE /") &&
            !/^PAGE \/(alerts|figures|home|load|mailbox|me|members|plan|settings|squad|not-allowed)/.test(key);
          if (
            subject === "outsider" &&
            (expected === 200 || expected === "ok") &&
            !LEAK_CHECK_SKIPS.has(key) &&
            !isPublicPage &&
            !key.startsWith("ACTION")
          ) {
            const leaked = TEAM_A_WORDS.filter((word) => outcome.body.toLowerCase().includes(word.toLowerCase()));
            expect(leaked, `${key} shows another team's names to an outsider`).toEqual([]);
          }
        });
      }
    });
  }
});
