import { NextResponse } from "next/server";
import { listUploadsFor } from "@/db/queries/fleet";
import { getSquawk, listSquawkEvents } from "@/db/queries/fleet-squawks";
import { apiError, withClub } from "@/lib/server/api";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** One squawk with every transition (who and when) and its files. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; squawkId: string }> }) {
  const { club, squawkId } = await params;
  return withClub(club, ["read", "Squawk"], (ctx) => {
    if (!isRecordId(squawkId)) return apiError("not_found", "Not found.");
    const squawk = getSquawk(ctx.db, ctx.club.id, squawkId);
    if (!squawk) return apiError("not_found", "Not found.");
    const { reportedById: _r, closedById: _c, ...rest } = squawk;
    return NextResponse.json({
      squawk: rest,
      events: listSquawkEvents(ctx.db, ctx.club.id, [squawk.id]),
      files: listUploadsFor(ctx.db, ctx.club.id, "Squawk", [squawk.id]).map((u) => ({ ...u, url: `/api/clubs/${ctx.club.slug}/uploads/${u.id}` })),
    });
  });
}
