import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { authorizeCredentials } from "@/lib/auth/credentials";
import { normaliseEmail } from "@/lib/auth/rate-limit";
import { enqueueEmail } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";

class RateLimited extends CredentialsSignin {
  code = "rate_limited";
}

const MAGIC_LINK_MINUTES = 15;

function clientIp(request: Request | undefined): string | null {
  const forwarded = request?.headers.get("x-forwarded-for");
  return forwarded?.split(",")[0]?.trim() || request?.headers.get("x-real-ip") || null;
}

function activeUserByEmail(email: string) {
  const user = getDb().select().from(users).where(eq(users.email, normaliseEmail(email))).get();
  return user && !user.disabledAt ? user : null;
}

export const { handlers, auth, signIn, signOut } = NextAuth(() => ({
  adapter: DrizzleAdapter(getDb(), {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  } as never),
  session: { strategy: "jwt", maxAge: 30 * 24 * 3600 },
  trustHost: true,
  // A production server without AUTH_SECRET refuses to start sessions rather than use a known key.
  secret: process.env.AUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : "hangarline-local-development-secret-change-me"),
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [
    Credentials({
      credentials: { email: {}, password: {} },
      async authorize(credentials, request) {
        const result = await authorizeCredentials(getDb(), credentials, clientIp(request));
        if (result.ok) return result.user;
        if (result.reason === "rate_limited") throw new RateLimited();
        return null;
      },
    }),
    {
      id: "email",
      type: "email",
      name: "E-mail link",
      maxAge: MAGIC_LINK_MINUTES * 60,
      normalizeIdentifier: normaliseEmail,
      async sendVerificationRequest({ identifier, url }) {
        // Only existing, active accounts get a link; the page says the same thing either way.
        if (!activeUserByEmail(identifier)) return;
        enqueueEmail(getDb(), {
          clubId: null,
          to: identifier,
          subject: "Your Hangarline sign-in link",
          template: "magic-link",
          payload: { url, expiresMinutes: MAGIC_LINK_MINUTES },
        });
        kickOutbox();
      },
    },
  ],
  callbacks: {
    async signIn({ user, email }) {
      if (email?.verificationRequest) return true;
      if (!user.email) return false;
      return Boolean(activeUserByEmail(user.email));
    },
    async jwt({ token, user }) {
      if (user?.id) token.sub = user.id;
      return token;
    },
    async session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
}));
