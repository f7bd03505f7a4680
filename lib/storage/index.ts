import { createHash, randomUUID } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { reencodeImage } from "./reencode";
import { EXTENSIONS, sniffMimeType, type AllowedMime } from "./sniff";

export { sniffMimeType, type AllowedMime } from "./sniff";

export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

export function uploadDir(): string {
  return path.resolve(process.env.UPLOAD_DIR ?? "./data/uploads");
}

export type CheckedFile = { bytes: Buffer; mimeType: AllowedMime; sizeBytes: number; sha256: string; originalName: string };

export type UploadCheck = { ok: true; file: CheckedFile } | { ok: false; message: string };

/**
 * Checks a browser File before anything is stored: size first, then the real type by content;
 * an image is then re-encoded without its metadata (see reencode.ts). Every upload passes here.
 */
export async function checkUpload(file: File, allowed: readonly AllowedMime[], maxBytes = MAX_UPLOAD_BYTES): Promise<UploadCheck> {
  const name = file.name || "upload";
  if (file.size === 0) return { ok: false, message: `"${name}" is empty.` };
  if (file.size > maxBytes) {
    return { ok: false, message: `"${name}" is ${(file.size / 1048576).toFixed(1)} MB; the limit is ${(maxBytes / 1048576).toFixed(0)} MB.` };
  }
  const original = Buffer.from(await file.arrayBuffer());
  const sniffed = sniffMimeType(original);
  if (!sniffed || !allowed.includes(sniffed)) {
    const kinds = allowed.map((m) => EXTENSIONS[m].toUpperCase()).join(", ");
    return { ok: false, message: `"${name}" is not a ${kinds} file (checked by its content, not its name).` };
  }
  const clean = await reencodeImage(original, sniffed, name);
  if (!clean.ok) return clean;
  const { bytes, mimeType } = clean;
  return { ok: true, file: { bytes, mimeType, sizeBytes: bytes.length, sha256: createHash("sha256").update(bytes).digest("hex"), originalName: storedName(name, mimeType) } };
}

/** Writes the bytes under a random key; call inside `prepare`, and record the row in the transaction. */
export function storeBytes(file: CheckedFile): string {
  const key = `${randomUUID()}.${EXTENSIONS[file.mimeType]}`;
  const dir = uploadDir();
  fs.mkdirSync(dir, { recursive: true });
  fs.writeFileSync(path.join(dir, key), file.bytes, { flag: "wx" });
  return key;
}

/** Removes bytes whose row was never written (the transaction failed). */
export function discardBytes(key: string): void {
  fs.rmSync(path.join(uploadDir(), path.basename(key)), { force: true });
}

export function readBytes(key: string): Buffer {
  return fs.readFileSync(path.join(uploadDir(), path.basename(key)));
}

/** The stored bytes, or null when the file is gone from the disk (answered as "not found"). */
export function readStoredBytes(key: string): Buffer | null {
  try {
    return readBytes(key);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT" || (error as NodeJS.ErrnoException).code === "EISDIR") return null;
    throw error;
  }
}

/** The name kept for a file: at most 200 characters; a HEIC photo stored as JPEG says so. */
function storedName(name: string, mimeType: AllowedMime): string {
  const renamed = mimeType === "image/jpeg" ? name.replace(/\.(heic|heif)$/i, ".jpg") : name;
  return renamed.slice(0, 200);
}

export const IMAGE_TYPES: readonly AllowedMime[] = ["image/jpeg", "image/png", "image/webp", "image/heic"];
export const DOCUMENT_TYPES: readonly AllowedMime[] = [...IMAGE_TYPES, "application/pdf"];
