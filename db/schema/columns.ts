import { integer, text } from "drizzle-orm/sqlite-core";

export const newId = () => crypto.randomUUID();

export const id = () => text("id").primaryKey().$defaultFn(newId);

/** created_at / updated_at as UTC instants (ms since epoch). */
export const timestamps = () => ({
  createdAt: integer("created_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
  updatedAt: integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .$defaultFn(() => new Date())
    .$onUpdateFn(() => new Date()),
});
