import { NextResponse } from "next/server";
import { z } from "zod";
import { getAircraft } from "@/db/queries/fleet";
import { listSquawks } from "@/db/queries/fleet-squawks";
import { apiError, withClub, zodToFields } from "@/lib/server/api";
import { recordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

const query = z.object({
  aircraftId: recordId("aircraftId must be an aircraft's id").optional(),
  status: z.enum(["open", "closed"], { error: "status must be open or closed" }).optional(),
});

export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Squawk"], (ctx) => {
    const parsed = query.safeParse(Object.fromEntries(new URL(req.url).searchParams));
    if (!parsed.success) return apiError("invalid", "Check the query.", zodToFields(parsed.error));
    const { aircraftId, status } = parsed.data;
    if (aircraftId && !getAircraft(ctx.db, ctx.club.id, aircraftId)) return apiError("not_found", "Not found.");
    const rows = listSquawks(ctx.db, ctx.club.id, { aircraftId, status, limit: 200 });
    return NextResponse.json({ squawks: rows.map(({ reportedById: _r, closedById: _c, ...s }) => s) });
  });
}
