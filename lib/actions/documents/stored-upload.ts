import type { Tx } from "@/db/client";
import { uploads } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";
import { DOCUMENT_TYPES, checkUpload, discardBytes, storeBytes, type CheckedFile } from "@/lib/storage";

export type StoredFile = { key: string; file: CheckedFile };

/**
 * For an action's `prepare`: checks the file by size and content before anything is written,
 * then stores the bytes. A refused file becomes a field error and leaves nothing behind.
 */
export async function checkAndStoreFile(file: File | undefined, field: string): Promise<StoredFile | null> {
  if (!file) return null;
  const check = await checkUpload(file, DOCUMENT_TYPES);
  if (!check.ok) throw new ActionError("The file was refused; nothing was saved.", { [field]: [check.message] });
  return { key: storeBytes(check.file), file: check.file };
}

/** Runs the transaction body; if it throws, the stored bytes are removed, since no row will point at them. */
export function discardOnFailure<T>(stored: StoredFile | null, body: () => T): T {
  try {
    return body();
  } catch (error) {
    if (stored) discardBytes(stored.key);
    throw error;
  }
}

export function insertUploadRow(
  tx: Tx,
  stored: StoredFile,
  row: { clubId: string; subjectType: "MemberDocument" | "Bulletin" | "Medical"; subjectId: string; ownerUserId: string | null; uploadedById: string },
): string {
  const [u] = tx
    .insert(uploads)
    .values({
      ...row,
      mimeType: stored.file.mimeType,
      sizeBytes: stored.file.sizeBytes,
      sha256: stored.file.sha256,
      originalName: stored.file.originalName,
      storageKey: stored.key,
    })
    .returning({ id: uploads.id })
    .all();
  return u!.id;
}
