import "server-only";
import type { Tx } from "@/db/client";
import { uploads } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";
import { checkUpload, discardBytes, storeBytes, type AllowedMime, type CheckedFile } from "@/lib/storage";

// Files that come with a fleet form (squawk photos, work orders, logbook pages, aircraft photo).
// Every file is checked before any is stored; the rows are written in the action's transaction,
// and the bytes are removed again when that transaction does not commit: no row, no file.

export type StoredFile = CheckedFile & { storageKey: string };

/** Checks all files by size and content; the first refusal becomes the field's error. */
export async function checkFiles(files: File[], allowed: readonly AllowedMime[], field: string): Promise<CheckedFile[]> {
  const checked: CheckedFile[] = [];
  const problems: string[] = [];
  for (const file of files) {
    const result = await checkUpload(file, allowed);
    if (result.ok) checked.push(result.file);
    else problems.push(result.message);
  }
  if (problems.length) throw new ActionError(`Nothing was saved: ${problems[0]}`, { [field]: problems });
  return checked;
}

export function storeFiles(files: CheckedFile[]): StoredFile[] {
  const stored: StoredFile[] = [];
  try {
    for (const f of files) stored.push({ ...f, storageKey: storeBytes(f) });
  } catch (error) {
    discardStored(stored);
    throw error;
  }
  return stored;
}

export function discardStored(files: StoredFile[]): void {
  for (const f of files) discardBytes(f.storageKey);
}

/** Runs the transaction body; when it throws, the bytes already written are removed. */
export function withStoredFiles<T>(files: StoredFile[], body: () => T): T {
  try {
    return body();
  } catch (error) {
    discardStored(files);
    throw error;
  }
}

export function insertUploadRows(
  tx: Tx,
  owner: { clubId: string; subjectType: "Squawk" | "InspectionCompletion" | "Aircraft" | "Bill"; subjectId: string; uploadedById: string },
  files: StoredFile[],
): string[] {
  const ids: string[] = [];
  for (const f of files) {
    const [row] = tx
      .insert(uploads)
      .values({ ...owner, ownerUserId: null, mimeType: f.mimeType, sizeBytes: f.sizeBytes, sha256: f.sha256, originalName: f.originalName, storageKey: f.storageKey })
      .returning({ id: uploads.id })
      .all();
    ids.push(row!.id);
  }
  return ids;
}
