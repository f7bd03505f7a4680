import { NextResponse } from "next/server";
import { listClubOutbox } from "@/db/queries/outbox";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Outbox"], (ctx) => NextResponse.json({ messages: listClubOutbox(ctx.db, ctx.club.id) }));
}
