import { NextResponse } from "next/server";
import { getCurrentMedical, getOwnBirthDate } from "@/db/queries/safety-documents";
import { apiError, withClub } from "@/lib/server/api";
import { medicalViewFor } from "@/lib/safety/medical-view";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/**
 * A member's current medical. The member and club admins get the details; instructors and the
 * safety officer the expiry date only; other members a 404. The date of birth is returned to
 * the member themselves and to nobody else.
 */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; userId: string }> }) {
  const { club, userId } = await params;
  return withClub(club, null, (ctx) => {
    if (!isRecordId(userId)) return apiError("not_found", "Not found.");
    const medical = getCurrentMedical(ctx.db, ctx.club.id, userId);
    const view = medical ? medicalViewFor(ctx.ability, userId, medical) : null;
    if (!medical || !view) return apiError("not_found", "Not found.");
    const self = userId === ctx.user.id;
    return NextResponse.json({ medical: self ? { ...view, birthDate: getOwnBirthDate(ctx.db, ctx.club.id, userId) } : view });
  });
}
