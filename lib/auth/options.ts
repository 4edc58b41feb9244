/**
 * next-auth configuration: e-mail + password, JWT sessions that carry the user id and roles.
 * Roles and the active flag are re-read from the database every 5 minutes, so a removed role stops working.
 */
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { findUserForSignIn, standingOf } from "@/db/users";
import { audit } from "@/db/audit";
import type { Role } from "@/db/schema/auth";
import { verifyPassword } from "./secrets";
import { attemptAllowed, BAD_CREDENTIALS_MESSAGE, clientAddress, noteFailure, noteSuccess, THROTTLED_MESSAGE } from "./throttle";

export const ROLE_REFRESH_MS = 5 * 60 * 1000;

declare module "next-auth" {
  interface Session {
    user: { id: number; email: string; name: string; roles: Role[] };
  }
}
declare module "next-auth/jwt" {
  interface JWT {
    uid?: number;
    roles?: Role[];
    checkedAt?: number;
    revoked?: boolean;
  }
}

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "e-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const email = String(credentials?.email ?? "").trim().toLowerCase();
        const password = String(credentials?.password ?? "");
        const address = clientAddress(req?.headers as Record<string, unknown> | undefined, process.env.TRUST_PROXY === "1");
        if (!email || !password) throw new Error(BAD_CREDENTIALS_MESSAGE);
        if (!(await attemptAllowed(email, address))) throw new Error(THROTTLED_MESSAGE);
        const user = await findUserForSignIn(email);
        const ok = !!user?.passwordHash && user.active && (await verifyPassword(password, user.passwordHash));
        if (!user || !ok) {
          await noteFailure(email, address);
          throw new Error(BAD_CREDENTIALS_MESSAGE);
        }
        await noteSuccess(email, address);
        await audit({ userId: user.id }, "user.sign_in", { type: "user", id: user.id });
        return { id: String(user.id), email: user.email, name: user.displayName };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      const now = Date.now();
      if (user) token.uid = Number(user.id);
      if (token.uid && (user || !token.checkedAt || now - token.checkedAt > ROLE_REFRESH_MS)) {
        const standing = await standingOf(token.uid);
        token.revoked = !standing || !standing.active;
        token.roles = standing?.active ? standing.roles : [];
        token.checkedAt = now;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = {
        id: token.revoked ? 0 : (token.uid ?? 0),
        email: token.email ?? "",
        name: token.name ?? "",
        roles: token.revoked ? [] : (token.roles ?? []),
      };
      return session;
    },
  },
};
