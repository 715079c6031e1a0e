import "server-only";
import type { NextAuthOptions } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { getDb } from "@/db";
import { clientIp } from "@/lib/server/client-ip";
import { checkCredentials } from "@/lib/server/sign-in";

/** Sessions last 12 hours; roles are not in the token but read from the database on every request. */
const SESSION_MAX_AGE_S = 12 * 60 * 60;

export const authOptions: NextAuthOptions = {
  secret: process.env.NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_S, updateAge: 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    Credentials({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const user = await checkCredentials(getDb(), credentials, clientIp(req.headers ?? {}));
        return user && { id: user.id, name: user.name, email: user.email, sessionVersion: user.sessionVersion };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.name = user.name;
        token.email = user.email;
        token.sv = user.sessionVersion;
      }
      // On `trigger: "update"` next-auth passes whatever the client sent as `session`; it is ignored on
      // purpose, so a client cannot write a role or another user's id into its own token.
      return token;
    },
    async session({ session, token }) {
      return {
        expires: session.expires,
        user: { id: token.sub ?? "", name: token.name ?? "", email: token.email ?? "", sessionVersion: token.sv ?? -1 },
      };
    },
  },
};
