import { getFlightLineJson } from "@/db/queries/fleet-status";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

/** The flight line as JSON, polled by the flight-line page to stay live (the club's snapshot, serialised once per change). */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Aircraft"], (ctx) =>
    new Response(getFlightLineJson(ctx.db, ctx.club), { headers: { "Content-Type": "application/json", "Cache-Control": "no-store" } }),
  );
}
