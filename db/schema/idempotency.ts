import { index, integer, primaryKey, sqliteTable, text } from "drizzle-orm/sqlite-core";

/**
 * One row per accepted write that carried an idempotency key (a form's hidden field, an API call's
 * `Idempotency-Key` header). The row is written in the same transaction as the write it answers, so
 * a second press, a retry or a replay with the same key finds it and gets the first answer back
 * without writing anything. Refused submissions are never stored (the person corrects and resends).
 *
 * `club_id` is the club's id, or '' for writes outside any club (operator console, invitations);
 * it is a scope, not a reference, for that reason. `actor_user_id` is null for anonymous writes
 * (no session, or an anonymous safety report, whose row keeps no link to the filer).
 * Rows older than 30 days are pruned (lib/server/idempotency.ts).
 */
export const idempotentWrites = sqliteTable(
  "idempotent_writes",
  {
    clubId: text("club_id").notNull(),
    key: text("key").notNull(),
    actionName: text("action_name").notNull(),
    actorUserId: text("actor_user_id"),
    /** The first answer as JSON: { message, data?, redirectTo?, revalidate? } (an action) or { status, body } (an API call). */
    answerJson: text("answer_json").notNull(),
    createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  },
  (t) => [primaryKey({ columns: [t.clubId, t.key] }), index("idempotent_writes_created_at").on(t.createdAt)],
);

export type IdempotentWrite = typeof idempotentWrites.$inferSelect;
