import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret } from "@/lib/env";
import { safeCallbackPath } from "./safe-redirect";
import { listMembershipsOfUser, verifyCredentials, type MembershipSummary } from "@/lib/data/users";
import { signInSchema } from "@/lib/validations/auth";

declare module "next-auth" {
  interface Session {
    user: { id: number; name: string; email: string; memberships: MembershipSummary[] };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid?: number;
    memberships?: MembershipSummary[];
  }
}

export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials) {
        const parsed = signInSchema.safeParse(credentials);
        if (!parsed.success) return null;
        const user = await verifyCredentials(parsed.data);
        return user ? { id: String(user.id), name: user.name, email: user.email } : null;
      },
    }),
  ],
  callbacks: {
    // Stricter than next-auth's own prefix check: only a normalised path on this site (lib/auth/safe-redirect.ts).
    redirect({ url, baseUrl }) {
      return `${baseUrl}${safeCallbackPath(url, { origin: baseUrl, fallback: "/" })}`;
    },
    async jwt({ token, user, trigger }) {
      if (user) token.uid = Number(user.id);
      // Memberships ride in the token for navigation only; every access check re-reads the database.
      if (token.uid && (user || trigger === "update" || !token.memberships)) {
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
};
