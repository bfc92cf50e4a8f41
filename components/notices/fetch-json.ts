/** Error with the server's message and per-field messages, so forms can show them where they belong. */
export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

async function answer<T>(res: Response): Promise<T> {
  const body = (await res.json().catch(() => null)) as {
    error?: { message?: string; fields?: Record<string, string[]> };
  } | null;
  if (!res.ok)
    throw new ApiError(body?.error?.message ?? `Request failed (${res.status})`, res.status, body?.error?.fields ?? {});
  return body as T;
}

/** SWR fetcher: throws on a non-2xx answer so the screen can show the message. */
export async function fetchJson<T>(url: string): Promise<T> {
  return answer<T>(await fetch(url, { headers: { accept: "application/json" } }));
}

export async function sendJson<T>(
  url: string,
  method: "POST" | "PUT" | "PATCH" | "DELETE",
  body?: unknown,
): Promise<T> {
  return answer<T>(
    await fetch(url, {
      method,
      headers: { "content-type": "application/json", accept: "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
  );
}
