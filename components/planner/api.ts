import type { PlanSession, PlanWeek, PlanWriteResult } from "@/lib/plan/types";
import type { RestrictionHit } from "@/lib/restrictions/rules";

/** A refusal from the server, with the per-field messages and, on 409 "stale", the session as it now is. */
export class PlanApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
    readonly current: PlanSession | null = null,
    /** On 409 "restricted": what the change would break; sending a reason overrides it. */
    readonly hits: RestrictionHit[] = [],
  ) {
    super(message);
    this.name = "PlanApiError";
  }
  get stale() {
    return this.code === "stale";
  }
  get restricted() {
    return this.code === "restricted";
  }
}

type ErrorBody = {
  error?: {
    code?: string;
    message?: string;
    fields?: Record<string, string[]>;
    current?: PlanSession;
    hits?: RestrictionHit[];
  };
};

export async function requestJson<T>(
  method: "GET" | "POST" | "PATCH" | "PUT" | "DELETE",
  url: string,
  body?: unknown,
): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new PlanApiError(0, "offline", "The server could not be reached. Check the connection and try again.");
  }
  const data = (await res.json().catch(() => ({}))) as T & ErrorBody;
  if (!res.ok) {
    const e = data.error ?? {};
    throw new PlanApiError(
      res.status,
      e.code ?? "error",
      e.message ?? `The server answered ${res.status}`,
      e.fields,
      e.current ?? null,
      e.hits ?? [],
    );
  }
  return data;
}

export const fetchWeek = (url: string) => requestJson<PlanWeek>("GET", url);
export const write = (method: "POST" | "PATCH" | "DELETE", url: string, body?: unknown) =>
  requestJson<PlanWriteResult>(method, url, body);
