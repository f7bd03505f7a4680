import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ActionButton } from "@/components/money/action-form";
import { StatementView } from "@/components/money/statement-view";
import { PageHeader } from "@/components/ui/page-header";
import { getMemberName } from "@/db/queries/money-member-accounts";
import { emailStatement } from "@/lib/actions/money/email-statement";
import { monthLabel } from "@/lib/money/months";
import { statementFor } from "@/db/queries/money-statements";
import { authorizePage } from "@/lib/server/authorize";
import { monthField } from "@/lib/validation/money";

export const metadata: Metadata = { title: "Member statement" };

export default async function MemberStatementPage({ params }: { params: Promise<{ club: string; userId: string; month: string }> }) {
  const { club: slug, userId, month } = await params;
  const { db, club } = await authorizePage(slug, ["read", "Account", { userId }]);
  const parsed = monthField.safeParse(month);
  const member = getMemberName(db, club.id, userId);
  if (!parsed.success || !member) notFound();
  return (
    <>
      <PageHeader
        title={`${member.name}: ${monthLabel(parsed.data, club.locale)}`}
        lead={<Link href={`/clubs/${club.slug}/money/members/${userId}`}>Back to the member&apos;s account</Link>}
        actions={<a className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold" href={`/api/clubs/${club.slug}/statements/${userId}/${parsed.data}`}>Download PDF</a>}
      />
      <StatementView figures={statementFor(db, club.id, userId, parsed.data)} currency={club.currency} locale={club.locale} title={`Statement for ${member.name}`} />
      <div className="mt-4"><ActionButton action={emailStatement} slug={club.slug} hidden={{ memberUserId: userId, month: parsed.data }} label="E-mail this statement to the member" pendingText="Queueing…" /></div>
    </>
  );
}
