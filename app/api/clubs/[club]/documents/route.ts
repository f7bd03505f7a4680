import { NextResponse } from "next/server";
import { listMemberDocuments } from "@/db/queries/safety-documents";
import { isoDateInTimeZone } from "@/lib/dates";
import { apiError, withClub } from "@/lib/server/api";
import { documentJson } from "@/lib/safety/document-json";
import { canOn } from "@/permissions";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** A member's documents: your own by default; ?userId= for those who may read others' (instructors, safety, admins). */
export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, null, (ctx) => {
    const userId = new URL(req.url).searchParams.get("userId") ?? ctx.user.id;
    if (!isRecordId(userId)) return apiError("invalid", "Check the query.", { userId: ["Give a member's id."] });
    if (!canOn(ctx.ability, "read", "MemberDocument", { userId: userId })) return apiError("not_found", "Not found.");
    const today = isoDateInTimeZone(new Date(), ctx.club.timeZone);
    const docs = listMemberDocuments(ctx.db, ctx.club.id, userId).map((d) => documentJson(ctx.club.slug, d, today, ctx.club.settings.documentReminderDays));
    return NextResponse.json({ documents: docs });
  });
}
