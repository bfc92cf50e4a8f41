import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { authSecret } from "@/lib/env";

// Early redirect only: every page, action and handler still checks access through lib/auth.
export async function proxy(req: NextRequest) {
  const token = await getToken({ req, secret: authSecret() });
  if (token) return NextResponse.next();
  const url = new URL("/sign-in", req.url);
  url.searchParams.set("callbackUrl", req.nextUrl.pathname + req.nextUrl.search);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/home/:path*", "/plan/:path*", "/load/:path*", "/alerts/:path*", "/squad/:path*", "/me/:path*", "/members/:path*", "/settings/:path*", "/mailbox/:path*"],
};
