// next-auth's forms over plain HTTP, the way a script (or an attacker) sends them: shared by the browser tests'
// sign-in, sign-out, throttling and redirect checks.

type AppUrl = { url: string };

/** A CSRF token and the cookie it belongs to (pass `cookie` to keep a signed-in session's cookies). */
export async function csrf(app: AppUrl, cookie?: string): Promise<{ csrfToken: string; cookie: string }> {
  const res = await fetch(`${app.url}/api/auth/csrf`, cookie ? { headers: { cookie } } : {});
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  const fresh = res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  return { csrfToken, cookie: cookie ?? fresh };
}

/** Posts a form to next-auth (`/api/auth/callback/credentials`, `/api/auth/signout`) without following redirects. */
export function postAuthForm(
  app: AppUrl,
  path: string,
  {
    cookie,
    fields,
    headers = {},
  }: { cookie: string; fields: Record<string, string>; headers?: Record<string, string> },
): Promise<Response> {
  return fetch(`${app.url}${path}`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie, ...headers },
    body: new URLSearchParams({ ...fields, json: "true" }),
  });
}

/** One credentials sign-in: a fresh CSRF token, then the form; `headers` e.g. sets X-Forwarded-For. */
export async function postCredentials(
  app: AppUrl,
  fields: { email: string; password: string; callbackUrl?: string },
  headers: Record<string, string> = {},
): Promise<Response> {
  const { csrfToken, cookie } = await csrf(app);
  return postAuthForm(app, "/api/auth/callback/credentials", { cookie, fields: { csrfToken, ...fields }, headers });
}
