import { NextResponse } from "next/server";
import { listMembers } from "@/db/queries/members";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Member"], (ctx) => {
    const members = listMembers(ctx.db, ctx.club.id).map((m) => ({ membershipId: m.membershipId, name: m.name, email: m.email, roles: m.roles, status: m.status, joinedOn: m.joinedOn }));
    return NextResponse.json({ members });
  });
}
