import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";

export const emailOutbox = sqliteTable(
  "email_outbox",
  {
    id: id(),
    /** Null only for messages that belong to no club (sign-in links). */
    clubId: text("club_id").references(() => clubs.id),
    template: text("template").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    /** Template props; the worker renders the message when it sends it. */
    payload: text("payload", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    status: text("status", { enum: ["pending", "sending", "sent", "failed"] }).notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: integer("next_attempt_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
    lockedUntil: integer("locked_until", { mode: "timestamp_ms" }),
    lastError: text("last_error"),
    providerMessageId: text("provider_message_id"),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("email_outbox_due").on(t.status, t.nextAttemptAt), index("email_outbox_club_id").on(t.clubId)],
);

export type OutboxMessage = typeof emailOutbox.$inferSelect;
