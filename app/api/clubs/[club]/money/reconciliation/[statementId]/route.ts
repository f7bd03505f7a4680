import { NextResponse } from "next/server";
import { getReconciliationWorkspace } from "@/db/queries/money-reconcile";
import { apiError, withClub } from "@/lib/server/api";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** The reconciliation workspace's data, refreshed live by the page. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; statementId: string }> }) {
  const { club, statementId } = await params;
  return withClub(club, ["read", "Reconciliation"], (ctx) => {
    if (!isRecordId(statementId)) return apiError("not_found", "Not found.");
    const workspace = getReconciliationWorkspace(ctx.db, ctx.club.id, statementId);
    if (!workspace) return apiError("not_found", "Not found.");
    return NextResponse.json(workspace);
  });
}
