import { NextResponse } from "next/server";
import { getCurrencyBoard } from "@/db/queries/currency";
import { isoDateInTimeZone } from "@/lib/dates";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

/** The currency board: every member's computed currency. Medicals appear as their expiry date only. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "CurrencyBoard"], (ctx) => {
    const today = isoDateInTimeZone(new Date(), ctx.club.timeZone);
    const rows = getCurrencyBoard(ctx.db, ctx.club, today).map((r) => ({ userId: r.userId, name: r.name, email: r.email, items: r.currency.items, next: r.currency.next, attention: r.currency.attention }));
    return NextResponse.json({ asOf: today, members: rows });
  });
}
