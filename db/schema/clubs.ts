import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import type { Role } from "@/permissions/roles";
import type { ClubSettings } from "@/lib/validation/club-settings";
import { users } from "./auth";
import { id, timestamps } from "./columns";

export const clubs = sqliteTable("clubs", {
  id: id(),
  slug: text("slug").notNull().unique(),
  name: text("name").notNull(),
  timeZone: text("time_zone").notNull(),
  currency: text("currency").notNull(),
  unitSystem: text("unit_system", { enum: ["imperial", "metric"] }).notNull(),
  /** BCP 47 tag money, numbers and dates are formatted for (en-US, de-DE, fr-FR …). */
  locale: text("locale").notNull().default("en-US"),
  settings: text("settings", { mode: "json" }).$type<ClubSettings>().notNull(),
  archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
  ...timestamps(),
});

export const memberships = sqliteTable(
  "memberships",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    roles: text("roles", { mode: "json" }).$type<Role[]>().notNull(),
    status: text("status", { enum: ["active", "inactive"] }).notNull().default("active"),
    joinedOn: text("joined_on").notNull(),
    deactivatedAt: integer("deactivated_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [uniqueIndex("memberships_club_user").on(t.clubId, t.userId), index("memberships_club_id").on(t.clubId)],
);

/** Which clubs an operator account administers. */
export const operatorAssignments = sqliteTable(
  "operator_assignments",
  {
    id: id(),
    userId: text("user_id").notNull().references(() => users.id),
    clubId: text("club_id").notNull().references(() => clubs.id),
    ...timestamps(),
  },
  (t) => [uniqueIndex("operator_assignments_user_club").on(t.userId, t.clubId), index("operator_assignments_club_id").on(t.clubId)],
);

export const invitations = sqliteTable(
  "invitations",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    email: text("email").notNull(),
    roles: text("roles", { mode: "json" }).$type<Role[]>().notNull(),
    /** SHA-256 of the secret in the link; the secret itself is never stored. */
    tokenHash: text("token_hash").notNull().unique(),
    invitedById: text("invited_by_id").notNull().references(() => users.id),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("invitations_club_id").on(t.clubId)],
);

export type Club = typeof clubs.$inferSelect;
export type NewClub = typeof clubs.$inferInsert;
export type Membership = typeof memberships.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
