import { index, integer, primaryKey, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { id, timestamps } from "./columns";

// The four tables Auth.js reads and writes, named our way (plural snake_case) with the column
// properties its Drizzle adapter expects.
export const users = sqliteTable("users", {
  id: id(),
  name: text("name"),
  email: text("email").notNull().unique(),
  emailVerified: integer("email_verified", { mode: "timestamp_ms" }),
  image: text("image"),
  passwordHash: text("password_hash"),
  /** "operator" marks an account that may create and administer clubs. */
  platformRole: text("platform_role", { enum: ["operator"] }),
  disabledAt: integer("disabled_at", { mode: "timestamp_ms" }),
  /** Sessions signed in before this instant are refused (sign-out everywhere, deactivation, role change). */
  sessionsValidAfter: integer("sessions_valid_after", { mode: "timestamp_ms" }),
  ...timestamps(),
});

export const accounts = sqliteTable(
  "accounts",
  {
    userId: text("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    type: text("type").$type<"email" | "oauth" | "oidc" | "webauthn">().notNull(),
    provider: text("provider").notNull(),
    providerAccountId: text("provider_account_id").notNull(),
    refresh_token: text("refresh_token"),
    access_token: text("access_token"),
    expires_at: integer("expires_at"),
    token_type: text("token_type"),
    scope: text("scope"),
    id_token: text("id_token"),
    session_state: text("session_state"),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);

export const sessions = sqliteTable("sessions", {
  sessionToken: text("session_token").primaryKey(),
  userId: text("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  expires: integer("expires", { mode: "timestamp_ms" }).notNull(),
});

export const verificationTokens = sqliteTable(
  "verification_tokens",
  {
    identifier: text("identifier").notNull(),
    token: text("token").notNull(),
    expires: integer("expires", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);

/**
 * Password sign-in attempts, kept for throttling only and pruned after a day. A row is reserved
 * ("pending") before the password is hashed, so parallel guesses count before any is tried.
 * `email_key` is the normalised e-mail (whether or not an account exists); `client_key` is the
 * client's address when a trusted proxy names it, else one shared bucket.
 */
export const signInAttempts = sqliteTable(
  "sign_in_attempts",
  {
    id: id(),
    emailKey: text("email_key").notNull(),
    clientKey: text("client_key").notNull(),
    outcome: text("outcome", { enum: ["pending", "failed", "succeeded"] }).notNull(),
    /** Cleared by a successful sign-in to the account: the row no longer slows the account down. */
    countsForAccount: integer("counts_for_account", { mode: "boolean" }).notNull().default(true),
    createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  },
  (t) => [
    index("sign_in_attempts_email_key").on(t.emailKey, t.createdAt),
    index("sign_in_attempts_client_key").on(t.clientKey, t.createdAt),
    index("sign_in_attempts_created_at").on(t.createdAt),
  ],
);

/** E-mail sign-in links sent (one row per e-mail queued), kept for throttling only and pruned after a day. */
export const signInLinkRequests = sqliteTable(
  "sign_in_link_requests",
  {
    id: id(),
    emailKey: text("email_key").notNull(),
    clientKey: text("client_key").notNull(),
    createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  },
  (t) => [
    index("sign_in_link_requests_email_key").on(t.emailKey, t.createdAt),
    index("sign_in_link_requests_client_key").on(t.clientKey, t.createdAt),
    index("sign_in_link_requests_created_at").on(t.createdAt),
  ],
);

/** Single sessions ended by signing out; a row lives until the session would have expired anyway. */
export const revokedSessions = sqliteTable(
  "revoked_sessions",
  {
    sessionId: text("session_id").primaryKey(),
    userId: text("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  },
  (t) => [index("revoked_sessions_expires_at").on(t.expiresAt), index("revoked_sessions_user_id").on(t.userId)],
);

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
