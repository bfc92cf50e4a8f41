import type { FieldErrors } from "@/lib/errors";

type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

/** The `error` object of a refusal (lib/http.ts `errorResponse`); handlers may add details such as `current`. */
type ErrorBody = { code?: string; message?: string; fields?: FieldErrors } & Record<string, unknown>;

export const OFFLINE_MESSAGE = "The server could not be reached. Check the connection and try again.";

/**
 * Every refusal the browser gets from our API, and a request that never reached it (status 0, code "offline").
 * `details` holds whatever else the handler put in its error (the session as it now is on 409 "stale", the
 * restriction hits on 409 "restricted"); `retryAfterS` is the server's Retry-After on 503 "busy".
 */
export class ApiError extends Error {
  readonly fields: FieldErrors;
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    fields: FieldErrors = {},
    readonly details: Record<string, unknown> = {},
    readonly retryAfterS: number | null = null,
  ) {
    super(message);
    this.name = "ApiError";
    this.fields = fields;
  }
  get stale() {
    return this.code === "stale";
  }
  get restricted() {
    return this.code === "restricted";
  }
  get implausible() {
    return this.code === "implausible";
  }
  get busy() {
    return this.code === "busy";
  }
  get offline() {
    return this.status === 0;
  }
}

/** Retry-After is either delay-seconds or an HTTP date (RFC 9110 §10.2.3); null when absent or unreadable. */
export function retryAfterSeconds(header: string | null, now = Date.now()): number | null {
  if (header === null || header.trim() === "") return null;
  if (/^\d+$/.test(header.trim())) return Number(header.trim());
  const at = Date.parse(header);
  return Number.isNaN(at) ? null : Math.max(0, Math.ceil((at - now) / 1000));
}

/** The body of an answer as JSON; an answer with no JSON body (204, a proxy's HTML page) reads as null. */
async function readJson(res: Response): Promise<unknown> {
  try {
    return await res.json();
  } catch {
    return null;
  }
}

/** Turns a non-2xx answer into an ApiError with the server's code, message and per-field messages. */
export async function toApiError(res: Response): Promise<ApiError> {
  const body = (await readJson(res)) as { error?: ErrorBody } | null;
  const { code, message, fields, ...details } = body?.error ?? {};
  return new ApiError(
    res.status,
    typeof code === "string" ? code : "error",
    typeof message === "string" ? message : `The server answered ${res.status}`,
    fields ?? {},
    details,
    retryAfterSeconds(res.headers.get("retry-after")),
  );
}

/** One request to our API: JSON in, JSON out; throws ApiError on a refusal or when the server is unreachable. */
async function requestJson<T>(method: Method, url: string, body?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: {
        accept: "application/json",
        ...(body === undefined ? {} : { "content-type": "application/json" }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, "offline", OFFLINE_MESSAGE);
  }
  if (!res.ok) throw await toApiError(res);
  return (await readJson(res)) as T;
}

/** The SWR fetcher: the key is the URL. */
export const fetchJson = <T>(url: string): Promise<T> => requestJson<T>("GET", url);

/** A write; the body type comes from the caller (see lib/client/api.ts, typed from the handler's schema). */
export const sendJson = <T>(method: Exclude<Method, "GET">, url: string, body?: unknown): Promise<T> =>
  requestJson<T>(method, url, body);
