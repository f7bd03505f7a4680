import { NextResponse } from "next/server";
import { getMemberDocument } from "@/db/queries/safety-documents";
import { isoDateInTimeZone } from "@/lib/dates";
import { apiError, withClub } from "@/lib/server/api";
import { documentJson } from "@/lib/safety/document-json";
import { canOn } from "@/permissions";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** One document. Another club's document, or one the viewer may not read, is a 404 like a missing one. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; documentId: string }> }) {
  const { club, documentId } = await params;
  return withClub(club, null, (ctx) => {
    if (!isRecordId(documentId)) return apiError("not_found", "Not found.");
    const doc = getMemberDocument(ctx.db, ctx.club.id, documentId);
    if (!doc || !canOn(ctx.ability, "read", "MemberDocument", { userId: doc.userId })) return apiError("not_found", "Not found.");
    const today = isoDateInTimeZone(new Date(), ctx.club.timeZone);
    return NextResponse.json({ document: documentJson(ctx.club.slug, doc, today, ctx.club.settings.documentReminderDays) });
  });
}
