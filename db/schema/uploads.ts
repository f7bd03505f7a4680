import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";

/** A stored file (photo, work order, logbook page, document). Bytes live outside public/. */
export const uploads = sqliteTable(
  "uploads",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    /** What the file belongs to, for the read check: "Squawk", "InspectionCompletion", "MemberDocument", … */
    subjectType: text("subject_type").notNull(),
    subjectId: text("subject_id"),
    /** The person a private file belongs to (member documents, receipts). */
    ownerUserId: text("owner_user_id").references(() => users.id),
    uploadedById: text("uploaded_by_id").notNull().references(() => users.id),
    mimeType: text("mime_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    sha256: text("sha256").notNull(),
    originalName: text("original_name").notNull(),
    storageKey: text("storage_key").notNull().unique(),
    ...timestamps(),
  },
  (t) => [index("uploads_club_id").on(t.clubId), index("uploads_subject").on(t.clubId, t.subjectType, t.subjectId)],
);

export type Upload = typeof uploads.$inferSelect;
