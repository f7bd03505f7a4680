import { and, eq } from "drizzle-orm";
import { uploads } from "@/db/schema";
import { apiError, withClub } from "@/lib/server/api";
import { canReadUpload } from "@/lib/server/upload-access";
import { readBytes } from "@/lib/storage";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ club: string; uploadId: string }> }) {
  const { club, uploadId } = await params;
  return withClub(club, null, (ctx) => {
    const row = ctx.db.select().from(uploads).where(and(eq(uploads.clubId, ctx.club.id), eq(uploads.id, uploadId))).get();
    if (!row || !canReadUpload(ctx.ability, row)) return apiError("not_found", "Not found.");
    const bytes = readBytes(row.storageKey);
    return new Response(new Uint8Array(bytes), {
      headers: {
        "Content-Type": row.mimeType,
        "Content-Length": String(bytes.length),
        "Content-Disposition": `inline; filename="${row.originalName.replace(/[^\w.\- ]/g, "_")}"`,
        "Cache-Control": "private, max-age=300",
        "X-Content-Type-Options": "nosniff",
      },
    });
  });
}
