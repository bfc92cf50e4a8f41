// Sends one matrix request as one caller and reduces the answer to what the table compares: a status for a
// handler, where a page ends up, or what a server action said.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Answer } from "./authz-expected";
import type { Subject, World } from "./authz-fixtures";
import type { Req } from "./authz-requests";

export type Outcome = { answer: Answer; status: number; body: string };

type ActionRef = { id: string; path: string };

/** Server action ids come from the build's manifest, as the browser gets them; posted to a page that uses them. */
export function actionRefs(): Map<string, ActionRef> {
  const dist = process.env.E2E_DIST_DIR || ".next-e2e";
  const manifest = JSON.parse(
    readFileSync(join(process.cwd(), dist, "server/server-reference-manifest.json"), "utf8"),
  ) as {
    node: Record<string, { exportedName?: string; filename?: string; workers: Record<string, unknown> }>;
  };
  const refs = new Map<string, ActionRef>();
  for (const [id, entry] of Object.entries(manifest.node)) {
    if (!entry.filename || !entry.exportedName) continue;
    const dir = entry.filename
      .replace(/^app\//, "")
      .replace(/\/actions\.ts$/, "")
      .split("/")
      .filter((p) => !/^\(.*\)$/.test(p))
      .join("/");
    const pages = Object.keys(entry.workers).map(
      (w) =>
        `/${w
          .replace(/^app\//, "")
          .replace(/\/page$/, "")
          .split("/")
          .filter((p) => !/^\(.*\)$/.test(p))
          .join("/")}`,
    );
    const path = (pages.find((p) => !p.includes("[")) ?? pages[0]).replace(/\[[^\]]+\]/g, "x");
    refs.set(`ACTION /${dir}#${entry.exportedName}`, { id, path });
  }
  return refs;
}

function where(location: string, w: World): Answer {
  const path = new URL(location, w.app.url).pathname;
  if (path === "/sign-in") return "sign-in";
  if (path === "/not-allowed") return "not-allowed";
  if (path === `/load/${w.athletes.maya.id}`) return "redirect:/load/[own]";
  return `redirect:${path}`;
}

/**
 * A page answers with a status when it decides before streaming starts, and inside the stream (still 200)
 * when a loading boundary has already been sent: then Next writes the redirect or not-found into the payload.
 */
function pageAnswer(res: Response, body: string, w: World): Answer {
  const location = res.headers.get("location");
  if (res.status >= 300 && res.status < 400 && location) return where(location, w);
  if (res.status === 404) return "not-found";
  if (res.status !== 200) return res.status;
  const redirect =
    /NEXT_REDIRECT;(?:replace|push);([^;"]+);/.exec(body) ??
    /http-equiv="refresh" content="\d+;url=([^"]+)"/.exec(body);
  if (redirect) return where(redirect[1].replace(/&amp;/g, "&"), w);
  const fallback = /NEXT_HTTP_ERROR_FALLBACK;(\d{3})/.exec(body);
  if (fallback) return fallback[1] === "404" ? "not-found" : Number(fallback[1]);
  return "ok";
}

function actionAnswer(res: Response, body: string, w: World): Answer {
  const location = res.headers.get("location");
  if (res.status >= 300 && res.status < 400 && location) return where(location, w);
  if (res.status !== 200) return res.status;
  const line = body.split("\n").find((l) => l.startsWith("1:"));
  if (!line) return `redirect:unparsed ${body.slice(0, 120)}`;
  const result = JSON.parse(line.slice(2)) as { ok: boolean; message?: string };
  if (result.ok) return "ok";
  if (result.message === "Sign in first") return 401;
  if (result.message === "Your role does not allow this") return 403;
  if (/not found|no such/i.test(result.message ?? "")) return 404;
  return "refused";
}

export async function call(
  w: World,
  subject: Subject,
  key: string,
  req: Req,
  actions: Map<string, ActionRef>,
): Promise<Outcome> {
  if (req.kind === "api") {
    const res = await w.as(subject, req.method, req.path, req.body);
    return { answer: res.status, status: res.status, body: await res.text() };
  }
  if (req.kind === "page") {
    const res = await w.clients[subject].fetch(req.path);
    const body = await res.text();
    return { answer: pageAnswer(res, body, w), status: res.status, body };
  }
  const ref = actions.get(key);
  if (!ref) throw new Error(`no server action ${key} in the build's manifest`);
  const res = await w.clients[subject].fetch(ref.path, {
    method: "POST",
    headers: {
      "next-action": ref.id,
      accept: "text/x-component",
      "content-type": "text/plain;charset=UTF-8",
      origin: w.app.url,
    },
    body: JSON.stringify(req.args),
  });
  const body = await res.text();
  return { answer: actionAnswer(res, body, w), status: res.status, body };
}
