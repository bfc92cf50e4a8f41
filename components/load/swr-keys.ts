import type { LoadView, Metric } from "@/lib/load/types";

// Every SWR key of the load screens, so a write elsewhere can `mutate` exactly what it changed.
export const loadKeys = {
  squadWeek: (teamId: number, week: string, view: LoadView) => `/api/teams/${teamId}/load?week=${week}&view=${view}`,
  athlete: (athleteId: number, q: { from: string; to: string; view: LoadView; metric: Metric }) =>
    `/api/athletes/${athleteId}/load?from=${q.from}&to=${q.to}&view=${q.view}&metric=${q.metric}`,
  /** Matches every cached range of one athlete (for `mutate(loadKeys.athleteMatcher(id))`). */
  athleteMatcher: (athleteId: number) => (key: unknown) =>
    typeof key === "string" && key.startsWith(`/api/athletes/${athleteId}/load?`),
  teamSettings: (teamId: number) => `/api/teams/${teamId}/settings`,
};

export class FetchError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }
}

/** SWR fetcher: JSON on 2xx, a FetchError with the server's message otherwise. */
export async function fetchJson<T>(url: string, init?: RequestInit): Promise<T> {
  const res = await fetch(url, {
    ...init,
    headers: {
      accept: "application/json",
      ...(init?.body ? { "content-type": "application/json" } : {}),
      ...init?.headers,
    },
  });
  const body = (await res.json().catch(() => null)) as {
    error?: { message?: string; fields?: Record<string, string[]> };
  } | null;
  if (!res.ok)
    throw new FetchError(body?.error?.message ?? `Request failed (${res.status})`, res.status, body?.error?.fields);
  return body as T;
}
