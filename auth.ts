import NextAuth from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";

/**
 * Auth.js with e-mail + password. Sessions are JWT cookies holding only the user id; role and team
 * are read from the database on every request (lib/server/auth/load-actor.ts).
 */
export const { handlers, auth, signIn, signOut } = NextAuth({
  trustHost: true,
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    Credentials({
      credentials: { email: {}, password: {} },
      authorize: (credentials, request) => verifyCredentials(credentials, request.headers),
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      return { sub: user?.id ?? token.sub };
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
});
