import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id } from "./columns";

// Append-only: no code path updates or deletes a row (a trigger in the migration refuses it).
export const auditLog = sqliteTable(
  "audit_log",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    actorId: text("actor_id").references(() => users.id),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: text("subject_id").notNull(),
    before: text("before", { mode: "json" }).$type<unknown>(),
    after: text("after", { mode: "json" }).$type<unknown>(),
    createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
    updatedAt: integer("updated_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  },
  (t) => [index("audit_log_club_id").on(t.clubId, t.createdAt)],
);

export type AuditEntry = typeof auditLog.$inferSelect;
