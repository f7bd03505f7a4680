import { getMemberName } from "@/db/queries/money-member-accounts";
import { monthLabel } from "@/lib/money/months";
import { clubToday } from "@/lib/money/settings";
import { renderStatementPdf } from "@/lib/money/statement-pdf";
import { statementFor } from "@/db/queries/money-statements";
import { apiError, withClub } from "@/lib/server/api";
import { monthField } from "@/lib/validation/money";
import { canOn } from "@/permissions";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** A member's monthly statement as PDF: their own, or any member's for a treasurer or admin. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; userId: string; month: string }> }) {
  const { club, userId, month } = await params;
  return withClub(club, null, async (ctx) => {
    if (!isRecordId(userId)) return apiError("not_found", "Not found.");
    // Someone else's statement is answered like a missing one.
    if (!canOn(ctx.ability, "read", "Account", { userId: userId })) return apiError("not_found", "Not found.");
    const parsed = monthField.safeParse(month);
    if (!parsed.success) return apiError("invalid", "Give the month as YYYY-MM.", { month: parsed.error.issues.map((i) => i.message) });
    const member = getMemberName(ctx.db, ctx.club.id, userId);
    if (!member) return apiError("not_found", "Not found.");
    const figures = statementFor(ctx.db, ctx.club.id, userId, parsed.data);
    const pdf = await renderStatementPdf({
      clubName: ctx.club.name,
      memberName: member.name,
      memberEmail: member.email,
      periodLabel: monthLabel(parsed.data, ctx.club.locale),
      currency: ctx.club.currency,
      locale: ctx.club.locale,
      figures,
      balanceNowMinor: figures.balanceNowMinor,
      generatedOn: clubToday(ctx.club),
    });
    return new Response(new Uint8Array(pdf), {
      headers: {
        "Content-Type": "application/pdf",
        "Content-Disposition": `inline; filename="statement-${ctx.club.slug}-${parsed.data}.pdf"`,
        "Cache-Control": "private, no-store",
      },
    });
  });
}
