import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";
import { ApiError, fetchJson, OFFLINE_MESSAGE, retryAfterSeconds, sendJson, toApiError } from "@/lib/client/fetcher";
import { busyResponse, BUSY_MESSAGE, RETRY_AFTER_S } from "@/lib/db/busy";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";

// The answers come from the server's own error mapping (lib/http.ts errorResponse, lib/db/busy.ts), so these
// tests pin the contract between the handlers and the browser, not a copy of it.

describe("toApiError: a refusal read back the way the browser gets it", () => {
  it("409 stale keeps the code, message and the session as it now is", async () => {
    const current = { id: 7, version: 4, title: "Flying 30s" };
    const res = errorResponse(new AppError("stale", "Someone changed this session", { details: { current } }));
    const e = await toApiError(res);
    expect(e).toBeInstanceOf(ApiError);
    expect(e).toMatchObject({ status: 409, code: "stale", message: "Someone changed this session", fields: {} });
    expect(e.stale).toBe(true);
    expect(e.restricted).toBe(false);
    expect(e.details).toEqual({ current });
    expect(e.retryAfterS).toBeNull();
  });

  it("409 restricted carries the hits; 404 and 403 keep their status", async () => {
    const hits = [{ athleteId: 3, date: "2026-03-02", rule: "no_kind", detail: "no plyometrics" }];
    const e = await toApiError(
      errorResponse(new AppError("restricted", "This goes past a restriction", { details: { hits } })),
    );
    expect(e.restricted).toBe(true);
    expect(e.details.hits).toEqual(hits);
    expect((await toApiError(errorResponse(new AppError("not_found", "Not found")))).status).toBe(404);
    expect((await toApiError(errorResponse(new AppError("forbidden", "No")))).code).toBe("forbidden");
  });

  it("400 from a zod refusal names each field with its messages", async () => {
    const parsed = z
      .object({ title: z.string().min(1, "Give it a title"), plannedRpe: z.number().max(10, "CR-10: 0 to 10") })
      .safeParse({ title: "", plannedRpe: 12 });
    const e = await toApiError(errorResponse(parsed.error));
    expect(e).toMatchObject({ status: 400, code: "invalid", message: "Invalid title, plannedRpe" });
    expect(e.fields).toEqual({ title: ["Give it a title"], plannedRpe: ["CR-10: 0 to 10"] });
  });

  it("503 busy carries Retry-After in seconds", async () => {
    const e = await toApiError(busyResponse());
    expect(e).toMatchObject({ status: 503, code: "busy", message: BUSY_MESSAGE, retryAfterS: RETRY_AFTER_S });
    expect(e.busy).toBe(true);
  });

  it("an answer that is not our JSON (a proxy's page, an empty body) still gives status and a message", async () => {
    const html = await toApiError(
      new Response("<html>Bad gateway</html>", { status: 502, headers: { "content-type": "text/html" } }),
    );
    expect(html).toMatchObject({
      status: 502,
      code: "error",
      message: "The server answered 502",
      fields: {},
      details: {},
    });
    expect((await toApiError(new Response(null, { status: 500 }))).message).toBe("The server answered 500");
  });
});

describe("retryAfterSeconds (RFC 9110 §10.2.3: delay-seconds or an HTTP-date)", () => {
  it("reads both forms and ignores what is neither", () => {
    expect(retryAfterSeconds("5")).toBe(5);
    const now = Date.parse("Wed, 02 Dec 2026 08:00:00 GMT");
    expect(retryAfterSeconds("Wed, 02 Dec 2026 08:00:30 GMT", now)).toBe(30);
    expect(retryAfterSeconds("Wed, 02 Dec 2026 07:59:00 GMT", now)).toBe(0);
    expect(retryAfterSeconds(null)).toBeNull();
    expect(retryAfterSeconds("soon")).toBeNull();
  });
});

describe("fetchJson / sendJson over real HTTP", () => {
  let server: Server;
  let base: string;
  const seen: { method?: string; type?: string; accept?: string; body: string }[] = [];

  beforeAll(async () => {
    // Each path answers with a Response built by the server code, written out over a real socket.
    const answers: Record<string, () => Response> = {
      "/ok": () => Response.json({ week: "2026-03-02" }),
      "/echo": () => Response.json({ saved: true }, { status: 201 }),
      "/empty": () => new Response(null, { status: 204 }),
      "/busy": () => busyResponse(),
      "/stale": () => errorResponse(new AppError("stale", "Changed", { details: { current: { id: 1 } } })),
    };
    server = createServer((req, res) => {
      let body = "";
      req.on("data", (c: Buffer) => (body += c.toString()));
      req.on("end", async () => {
        seen.push({ method: req.method, type: req.headers["content-type"], accept: req.headers.accept, body });
        const answer = (answers[req.url ?? ""] ?? (() => errorResponse(new AppError("not_found", "Not found"))))();
        res.writeHead(answer.status, Object.fromEntries(answer.headers.entries()));
        res.end(Buffer.from(await answer.arrayBuffer()));
      });
    });
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(() => new Promise<void>((r) => server.close(() => r())));

  it("GET gives the JSON; a write sends JSON with its content type", async () => {
    expect(await fetchJson(`${base}/ok`)).toEqual({ week: "2026-03-02" });
    expect(seen.at(-1)).toMatchObject({ method: "GET", accept: "application/json", type: undefined, body: "" });
    expect(await sendJson("POST", `${base}/echo`, { version: 3, date: "2026-03-04" })).toEqual({ saved: true });
    expect(seen.at(-1)).toMatchObject({ method: "POST", type: "application/json" });
    expect(JSON.parse(seen.at(-1)!.body)).toEqual({ version: 3, date: "2026-03-04" });
    expect(await sendJson("DELETE", `${base}/empty`)).toBeNull();
  });

  it("throws ApiError for a refusal, with Retry-After on 503", async () => {
    await expect(sendJson("PATCH", `${base}/busy`, {})).rejects.toMatchObject({
      status: 503,
      code: "busy",
      retryAfterS: 5,
    });
    const stale = await sendJson("PATCH", `${base}/stale`, {}).catch((e: unknown) => e);
    expect(stale).toBeInstanceOf(ApiError);
    expect(stale).toMatchObject({ status: 409, stale: true, details: { current: { id: 1 } } });
    await expect(fetchJson(`${base}/nowhere`)).rejects.toMatchObject({ status: 404, code: "not_found" });
  });

  it("a server that cannot be reached is status 0, code offline", async () => {
    const closed = createServer();
    await new Promise<void>((r) => closed.listen(0, "127.0.0.1", r));
    const port = (closed.address() as AddressInfo).port;
    await new Promise<void>((r) => closed.close(() => r()));
    const e = await fetchJson(`http://127.0.0.1:${port}/x`).catch((err: unknown) => err);
    expect(e).toBeInstanceOf(ApiError);
    expect(e).toMatchObject({ status: 0, code: "offline", message: OFFLINE_MESSAGE, offline: true });
  });
});
