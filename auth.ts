import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth, { CredentialsSignin, type NextAuthConfig } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { clientKeyFrom } from "@/lib/auth/client-key";
import { authorizeCredentials } from "@/lib/auth/credentials";
import { normaliseEmail, pruneSignInRecordsNowAndThen, reserveSignInLink } from "@/lib/auth/rate-limit";
import { isSessionCurrent, newSessionClaims, revokeSession, SESSION_MAX_AGE_SECONDS } from "@/lib/auth/sessions";
import { enqueueEmail } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { assertDeploymentConfig, isBuildPhase } from "@/lib/server/deployment-config";
import { hasConfiguredBaseUrl, safeRedirectTarget, signInLinkOnConfiguredOrigin } from "@/lib/server/urls";

class RateLimited extends CredentialsSignin {
  code = "rate_limited";
}

const MAGIC_LINK_MINUTES = 15;
const DEVELOPMENT_SECRET = "hangarline-local-development-secret-change-me";

function activeUserByEmail(email: string) {
  const user = getDb().select().from(users).where(eq(users.email, normaliseEmail(email))).get();
  return user && !user.disabledAt ? user : null;
}

/** The Auth.js configuration (exported for the integration tests, which drive it through Auth.js itself). */
export function authConfig(): NextAuthConfig {
  // A production server refuses to run without AUTH_URL and a real AUTH_SECRET (instrumentation.ts
  // checks at start-up; this catches a server started some other way).
  if (!isBuildPhase()) assertDeploymentConfig();
  return {
    adapter: DrizzleAdapter(getDb(), {
      usersTable: users,
      accountsTable: accounts,
      sessionsTable: sessions,
      verificationTokensTable: verificationTokens,
    } as never),
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
    // No trustHost: with AUTH_URL set (required in production) Auth.js builds its URLs from it and
    // never from the Host / X-Forwarded-Host headers; in development Auth.js trusts the host itself.
    secret: process.env.AUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : DEVELOPMENT_SECRET),
    pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
    providers: [
      Credentials({
        credentials: { email: {}, password: {} },
        async authorize(credentials, request) {
          const result = await authorizeCredentials(getDb(), credentials, clientKeyFrom(request?.headers));
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
        async sendVerificationRequest({ identifier, url, request }) {
          // Only existing, active accounts get a link, a few per address and per client; the page
          // says the same thing in every case.
          if (!activeUserByEmail(identifier)) return;
          const db = getDb();
          pruneSignInRecordsNowAndThen(db);
          if (!reserveSignInLink(db, identifier, clientKeyFrom(request?.headers))) return;
          enqueueEmail(db, {
            clubId: null,
            to: identifier,
            subject: "Your Hangarline sign-in link",
            template: "magic-link",
            // Rebuilt on the configured address: whatever host the request named never reaches the link.
            payload: { url: signInLinkOnConfiguredOrigin(url), expiresMinutes: MAGIC_LINK_MINUTES },
          });
          kickOutbox();
        },
      },
    ],
    callbacks: {
      // After sign-in, only ever to a path on our own configured address.
      // (A development server started without any address stays on the host it was opened with.)
      async redirect({ url, baseUrl }) {
        return safeRedirectTarget(url, "/clubs", hasConfiguredBaseUrl() ? undefined : new URL(baseUrl).origin);
      },
      async signIn({ user, email }) {
        if (email?.verificationRequest) return true;
        if (!user.email) return false;
        return Boolean(activeUserByEmail(user.email));
      },
      async jwt({ token, user }) {
        if (user?.id) return { ...token, sub: user.id, ...newSessionClaims() };
        // Every read of the session: a revoked or deactivated one ends here (Auth.js clears the cookie).
        return isSessionCurrent(getDb(), token) ? token : null;
      },
      async session({ session, token }) {
        if (token.sub) session.user.id = token.sub;
        return session;
      },
    },
    events: {
      async signOut(message) {
        if ("token" in message && message.token) revokeSession(getDb(), message.token);
      },
    },
  };
}

export const { handlers, auth, signIn, signOut } = NextAuth(() => authConfig());
