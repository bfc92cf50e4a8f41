import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret } from "@/lib/env";
import { endSession, startSession, touchSession } from "@/lib/data/auth-sessions";
import { beginSignInAttempt, signInSucceeded } from "@/lib/data/sign-in-limits";
import { listMembershipsOfUser, verifyCredentials, type MembershipSummary } from "@/lib/data/users";
import { signInSchema } from "@/lib/validations/auth";
import { clientAddress } from "./client-address";
import { safeCallbackPath } from "./safe-redirect";
import { sessionPolicy } from "./session-policy";
import { BUSY_CODE, throttledCode } from "./sign-in-messages";

declare module "next-auth" {
  interface Session {
    user: { id: number; name: string; email: string; memberships: MembershipSummary[] };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid?: number;
    /** Names the session's row in auth_sessions (lib/data/auth-sessions.ts). */
    sid?: string;
    memberships?: MembershipSummary[];
  }
}

/** Thrown from the jwt callback so next-auth drops the cookie and getServerSession answers null. */
class SessionEnded extends Error {
  constructor() {
    super("SessionEnded");
    this.name = "SessionEnded";
  }
}

export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  // The cookie lives as long as the absolute lifetime; the idle timeout and revocation are checked in the database.
  session: { strategy: "jwt", maxAge: Math.round(sessionPolicy().maxMs / 1000) },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials);
        const address = clientAddress(req?.headers);
        const email = parsed.success ? parsed.data.email : null;
        const attempt = await beginSignInAttempt({ email, address });
        // next-auth turns a thrown error into ?error=<message>; the form words it (lib/auth/sign-in-messages.ts).
        if (!attempt.allowed) throw new Error(throttledCode(attempt.retryAfterMs));
        if (!parsed.success) return null;
        const user = await verifyCredentials(parsed.data);
        if (!user) return null;
        await signInSucceeded({ email: parsed.data.email, address });
        // The session row is written here, where a failure (database locked by another process) becomes a
        // message on the form instead of a 500 from the jwt callback.
        const sid = await startSession({ userId: user.id }).catch((err: unknown) => {
          console.error("could not start a session", err);
          throw new Error(BUSY_CODE);
        });
        return { id: String(user.id), name: user.name, email: user.email, sid };
      },
    }),
  ],
  callbacks: {
    // Stricter than next-auth's own prefix check: only a normalised path on this site (lib/auth/safe-redirect.ts).
    redirect({ url, baseUrl }) {
      return `${baseUrl}${safeCallbackPath(url, { origin: baseUrl, fallback: "/" })}`;
    },
    // Runs on sign-in and on every session read (each getServerSession): the session must still have its row.
    async jwt({ token, user, trigger }) {
      if (user) {
        token.uid = Number(user.id);
        token.sid = (user as { sid?: string }).sid;
      } else if (!token.uid || !token.sid || !(await touchSession({ sid: token.sid, userId: token.uid }))) {
        throw new SessionEnded();
      }
      // Memberships ride in the token for navigation only; every access check re-reads the database.
      if (user || trigger === "update" || !token.memberships) {
        token.memberships = await listMembershipsOfUser({ userId: token.uid });
      }
      return token;
    },
    async session({ session, token }) {
      session.user = {
        id: token.uid ?? 0,
        name: token.name ?? "",
        email: token.email ?? "",
        memberships: token.memberships ?? [],
      };
      return session;
    },
  },
  events: {
    // Sign-out ends the session on the server too, so a copied cookie no longer works.
    async signOut({ token }) {
      if (token?.sid) await endSession({ sid: token.sid });
    },
  },
  logger: {
    error(code, metadata) {
      // An ended session is an expected answer (signed out, reset, idle), not a fault.
      if (metadata instanceof Error && metadata.name === "SessionEnded") return;
      console.error(`[next-auth][error][${code}]`, metadata);
    },
  },
};
