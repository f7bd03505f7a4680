import { bulletinAckStats, getBulletin } from "@/db/queries/safety-bulletins";
import { apiError, withClub } from "@/lib/server/api";
import { writeCsv } from "@/lib/csv";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** The acknowledgement list as CSV (RFC 4180), one row per audience member. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; bulletinId: string }> }) {
  const { club, bulletinId } = await params;
  return withClub(club, ["export", "Bulletin"], (ctx) => {
    if (!isRecordId(bulletinId)) return apiError("not_found", "Not found.");
    const bulletin = getBulletin(ctx.db, ctx.club.id, bulletinId);
    if (!bulletin || bulletin.status !== "published") return apiError("not_found", "Not found.");
    const stats = bulletinAckStats(ctx.db, ctx.club.id, bulletin);
    const csv = writeCsv(
      ["Bulletin", "Version", "Member", "E-mail", "Acknowledged", "Acknowledged at (UTC)", "Deadline"],
      stats.rows.map((r) => [bulletin.title, bulletin.version, r.name ?? "", r.email, r.acknowledgedAt ? "yes" : "no", r.acknowledgedAt?.toISOString() ?? "", bulletin.acknowledgeBy ? { day: bulletin.acknowledgeBy } : ""]),
      { locale: ctx.club.locale },
    );
    const name = `acknowledgements-${bulletin.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "bulletin"}-v${bulletin.version}.csv`;
    return new Response(csv, {
      headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="${name}"`, "Cache-Control": "no-store" },
    });
  });
}
