import "server-only";
import { z } from "zod";
import { UniqueConstraintError, ValidationError } from "sequelize";
import { busyResponse, isDatabaseBusy } from "@/lib/db/busy";
import { AppError, type FieldErrors } from "@/lib/errors";
import { JSON_BODY_LIMIT, readBodyText } from "@/lib/http-body";
import { assertSameOrigin } from "@/lib/http-origin";

export function zodFields(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function errorResponse(err: unknown): Response {
  if (err instanceof AppError) {
    return Response.json(
      { error: { code: err.code, message: err.message, fields: err.fields, ...err.details } },
      { status: err.status },
    );
  }
  if (err instanceof z.ZodError) {
    const fields = zodFields(err);
    return Response.json(
      { error: { code: "invalid", message: `Invalid ${Object.keys(fields).join(", ")}`, fields } },
      { status: 400 },
    );
  }
  if (err instanceof UniqueConstraintError) {
    const field = err.errors[0]?.path ?? "_";
    return Response.json(
      { error: { code: "conflict", message: `${field} is already in use`, fields: { [field]: ["Already in use"] } } },
      { status: 409 },
    );
  }
  if (err instanceof ValidationError) {
    const fields: FieldErrors = {};
    for (const e of err.errors) (fields[e.path ?? "_"] ??= []).push(e.message);
    return Response.json({ error: { code: "invalid", message: "Invalid input", fields } }, { status: 400 });
  }
  if (isDatabaseBusy(err)) return busyResponse();
  console.error("[sprintwright] unexpected error", err);
  return Response.json({ error: { code: "internal", message: "Something went wrong on our side" } }, { status: 500 });
}

type Ctx<P> = { params: Promise<P> };

/**
 * Wraps a route handler so every known error becomes a JSON answer with its status. Before the handler runs,
 * a state-changing request from a browser page of another origin is refused (lib/http-origin.ts); every answer
 * that has not chosen its own caching gets `Cache-Control: no-store` (they are per-user and often private).
 */
export function route<P = Record<string, string>>(fn: (req: Request, ctx: Ctx<P>) => Promise<Response>) {
  return async (req: Request, ctx: Ctx<P>): Promise<Response> => {
    let res: Response;
    try {
      assertSameOrigin(req);
      res = await fn(req, ctx);
    } catch (err) {
      res = errorResponse(err);
    }
    if (!res.headers.has("cache-control")) res.headers.set("cache-control", "no-store");
    return res;
  };
}

export async function parseJson<T extends z.ZodType>(req: Request, schema: T): Promise<z.infer<T>> {
  return parseJsonText(await readBodyText(req, JSON_BODY_LIMIT), schema);
}

/** Like parseJson, but an empty body reads as `{}`: a POST whose options are all optional may send none. */
export async function parseOptionalJson<T extends z.ZodType>(req: Request, schema: T): Promise<z.infer<T>> {
  const text = await readBodyText(req, JSON_BODY_LIMIT);
  return parseJsonText(text.trim() === "" ? "{}" : text, schema);
}

function parseJsonText<T extends z.ZodType>(text: string, schema: T): z.infer<T> {
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new AppError("invalid", "The request body must be JSON", { fields: { _: ["Not valid JSON"] } });
  }
  return schema.parse(body);
}

export function parseQuery<T extends z.ZodType>(req: Request, schema: T): z.infer<T> {
  const params = Object.fromEntries(new URL(req.url).searchParams.entries());
  return schema.parse(params);
}

export function parseParams<T extends z.ZodType>(params: unknown, schema: T): z.infer<T> {
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw new AppError("not_found", "Not found");
  return parsed.data;
}
