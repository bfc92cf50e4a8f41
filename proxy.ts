import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { authSecret } from "@/lib/env";
import { contentSecurityPolicy, newNonce } from "@/lib/security/csp";

// Screens a signed-out visitor is sent to sign in from.
const SIGNED_IN_ONLY = /^\/(home|plan|load|alerts|squad|me|members|settings|mailbox)(\/|$)/;

// Early redirect only: every page, action and handler still checks access through lib/auth.
async function signInGate(req: NextRequest): Promise<NextResponse | null> {
  const token = await getToken({ req, secret: authSecret() });
  if (token) return null;
  const url = new URL("/sign-in", req.url);
  url.searchParams.set("callbackUrl", req.nextUrl.pathname + req.nextUrl.search);
  return NextResponse.redirect(url);
}

// Same figure as next.config.mjs serverActions.bodySizeLimit: over it Next.js itself answers 500, so a
// declared length over it is answered 413 here first.
const ACTION_BODY_LIMIT = 200 * 1024;

export async function proxy(req: NextRequest) {
  if (req.headers.has("next-action") && Number(req.headers.get("content-length") ?? 0) > ACTION_BODY_LIMIT) {
    return new NextResponse("The request body is over 200 kB", {
      status: 413,
      headers: { "content-type": "text/plain; charset=utf-8" },
    });
  }
  const csp = contentSecurityPolicy({ nonce: newNonce(), dev: process.env.NODE_ENV === "development" });
  const gate = SIGNED_IN_ONLY.test(req.nextUrl.pathname) ? await signInGate(req) : null;
  // Next.js takes the nonce for its scripts from the policy on the request.
  const headers = new Headers(req.headers);
  headers.set("content-security-policy", csp);
  const res = gate ?? NextResponse.next({ request: { headers } });
  res.headers.set("content-security-policy", csp);
  return res;
}

export const config = {
  // Every page, for its nonce; not the API (its policy comes from next.config.mjs) nor build files.
  matcher: ["/((?!api/|_next/static/|_next/image|favicon\\.ico|icon\\.svg).*)"],
};
