import "server-only";
import { appUrl } from "@/lib/env";
import { AppError } from "@/lib/errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

function originOf(url: string): string | null {
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

/**
 * Defence in depth against cross-site writes (OWASP ASVS 4.0 §4.2.2, 13.2.3), on top of next-auth's SameSite=Lax
 * session cookie. A POST, PUT, PATCH or DELETE that a browser sends from a page says where it comes from:
 * `Origin` must be this server's own origin (as the request reached it) or the configured APP_URL/NEXTAUTH_URL,
 * and `Sec-Fetch-Site`, when sent, must not be "cross-site" or "same-site". A request with neither header comes
 * from a client that is not a browser page (curl, a script with its own cookie): browsers send Origin on every
 * such request, so no page can make one, and those clients are let through to the usual session check.
 */
export function assertSameOrigin(req: Request): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const site = req.headers.get("sec-fetch-site");
  if (site === "cross-site" || site === "same-site") throw refused();
  const origin = req.headers.get("origin");
  if (origin === null) return;
  const allowed = [originOf(req.url), originOf(appUrl())];
  if (!allowed.includes(origin)) throw refused();
}

function refused(): AppError {
  return new AppError("forbidden", "Requests from other sites are refused", {
    fields: { origin: ["Send the request from this app's own pages"] },
  });
}
