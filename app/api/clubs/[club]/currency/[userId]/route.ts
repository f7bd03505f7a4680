import { NextResponse } from "next/server";
import { getMemberCurrency } from "@/db/queries/currency";
import { getActiveMember } from "@/db/queries/safety-checkouts";
import { isoDateInTimeZone } from "@/lib/dates";
import { apiError, withClub } from "@/lib/server/api";
import { canOn } from "@/permissions";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** One member's currency: their own, or anyone's for instructors, the safety officer and admins. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; userId: string }> }) {
  const { club, userId } = await params;
  return withClub(club, null, (ctx) => {
    if (!isRecordId(userId)) return apiError("not_found", "Not found.");
    if (!canOn(ctx.ability, "read", "Currency", { userId: userId }) || !getActiveMember(ctx.db, ctx.club.id, userId)) return apiError("not_found", "Not found.");
    const today = isoDateInTimeZone(new Date(), ctx.club.timeZone);
    return NextResponse.json({ asOf: today, userId, ...getMemberCurrency(ctx.db, ctx.club, userId, today) });
  });
}
