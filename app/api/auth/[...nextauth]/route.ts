import NextAuth from "next-auth";
import { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";

export const runtime = "nodejs";

const handler = NextAuth(authOptions);
type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth reads a JSON body itself and answers 500 when it does not parse; a body that is not a JSON object
 * is refused here with a 400 naming it, like every other handler.
 */
async function POST(req: NextRequest, ctx: Ctx): Promise<Response> {
  if (!(req.headers.get("content-type") ?? "").includes("application/json")) return handler(req, ctx);
  const text = await req.text();
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    body = undefined;
  }
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    return Response.json(
      {
        error: {
          code: "invalid",
          message: "The request body must be a JSON object",
          fields: { _: ["Not a JSON object"] },
        },
      },
      { status: 400 },
    );
  }
  return handler(new NextRequest(req, { body: text }), ctx);
}

export { handler as GET, POST };
