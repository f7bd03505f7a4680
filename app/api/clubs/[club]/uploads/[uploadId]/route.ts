import { and, eq } from "drizzle-orm";
import { uploads } from "@/db/schema";
import { apiError, withClub } from "@/lib/server/api";
import { canReadUpload, isClubWideUpload } from "@/lib/server/upload-access";
import { readStoredBytes } from "@/lib/storage";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** Photos the page shows are answered inline; anything else (PDFs, HEIC) only as a download. */
const INLINE_TYPES = new Set(["image/jpeg", "image/png", "image/webp"]);

export async function GET(_req: Request, { params }: { params: Promise<{ club: string; uploadId: string }> }) {
  const { club, uploadId } = await params;
  return withClub(club, null, (ctx) => {
    if (!isRecordId(uploadId)) return apiError("not_found", "Not found.");
    const row = ctx.db.select().from(uploads).where(and(eq(uploads.clubId, ctx.club.id), eq(uploads.id, uploadId))).get();
    if (!row || !canReadUpload(ctx.ability, row)) return apiError("not_found", "Not found.");
    // A row whose file is gone from the disk is answered like a missing file, not as a failure.
    const bytes = readStoredBytes(row.storageKey);
    if (!bytes) return apiError("not_found", "Not found.");
    const name = row.originalName.replace(/[^\w.\- ]/g, "_");
    return new Response(new Uint8Array(bytes), {
      headers: {
        "Content-Type": row.mimeType,
        "Content-Length": String(bytes.length),
        "Content-Disposition": `${INLINE_TYPES.has(row.mimeType) ? "inline" : "attachment"}; filename="${name}"`,
        // Opened on its own, a stored file runs no script and reaches nothing of the portal.
        "Content-Security-Policy": "sandbox",
        "X-Content-Type-Options": "nosniff",
        "Cache-Control": isClubWideUpload(row) ? "private, max-age=300" : "no-store",
      },
    });
  });
}
