import { getFlightLineEtag, getFlightLineJson } from "@/db/queries/fleet-status";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

/**
 * The flight line as JSON, polled by the flight-line page to stay live (the club's snapshot,
 * serialised once per change). A poll naming the tag of the snapshot it holds (If-None-Match)
 * is answered 304 with no body while nothing changed: most polls cost no serialisation at all.
 */
export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Aircraft"], (ctx) => {
    const now = new Date();
    const etag = getFlightLineEtag(ctx.db, ctx.club, now);
    // The tag first, then the body: a write landing between the two reads can only make the body newer
    // than its tag, and the next poll then gets the whole answer again (never a stale one kept).
    const headers = { ETag: etag, "Cache-Control": "no-store" };
    if (matches(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
    return new Response(getFlightLineJson(ctx.db, ctx.club, now), { headers: { ...headers, "Content-Type": "application/json" } });
  });
}

/** RFC 9110 13.1.2: If-None-Match holds "*" or a list of tags, compared weakly. */
function matches(header: string | null, etag: string): boolean {
  if (!header) return false;
  if (header.trim() === "*") return true;
  return header.split(",").some((t) => t.trim().replace(/^W\//, "") === etag);
}
