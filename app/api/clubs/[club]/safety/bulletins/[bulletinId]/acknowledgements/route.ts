import { NextResponse } from "next/server";
import { bulletinAckStats, getBulletin } from "@/db/queries/safety-bulletins";
import { apiError, withClub } from "@/lib/server/api";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** Who of the audience has and has not acknowledged one bulletin version (polled by the officer's page). */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; bulletinId: string }> }) {
  const { club, bulletinId } = await params;
  return withClub(club, ["readAcknowledgements", "Bulletin"], (ctx) => {
    if (!isRecordId(bulletinId)) return apiError("not_found", "Not found.");
    const bulletin = getBulletin(ctx.db, ctx.club.id, bulletinId);
    if (!bulletin || bulletin.status !== "published") return apiError("not_found", "Not found.");
    const stats = bulletinAckStats(ctx.db, ctx.club.id, bulletin);
    return NextResponse.json({
      bulletinId: bulletin.id,
      version: bulletin.version,
      audience: stats.audience,
      acknowledged: stats.acknowledged,
      outstanding: stats.outstanding,
      percent: stats.percent,
      rows: stats.rows.map((r) => ({ userId: r.userId, name: r.name, email: r.email, acknowledgedAt: r.acknowledgedAt?.toISOString() ?? null })),
    });
  });
}
