import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ActionButton } from "@/components/money/action-form";
import { StatementView } from "@/components/money/statement-view";
import { PageHeader } from "@/components/ui/page-header";
import { emailStatement } from "@/lib/actions/money/email-statement";
import { monthLabel } from "@/lib/money/months";
import { statementFor } from "@/db/queries/money-statements";
import { authorizePage, ownRecord } from "@/lib/server/authorize";
import { monthField } from "@/lib/validation/money";

export const metadata: Metadata = { title: "Statement" };

export default async function MyStatementPage({ params }: { params: Promise<{ club: string; month: string }> }) {
  const { club: slug, month } = await params;
  const { db, club, user } = await authorizePage(slug, ownRecord("read", "Account"));
  const parsed = monthField.safeParse(month);
  if (!parsed.success) notFound();
  const figures = statementFor(db, club.id, user.id, parsed.data);
  return (
    <div className="max-w-4xl">
      <PageHeader
        title={`Statement for ${monthLabel(parsed.data, club.locale)}`}
        lead={<Link href={`/clubs/${club.slug}/account`}>Back to my account</Link>}
        actions={<a className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold" href={`/api/clubs/${club.slug}/statements/${user.id}/${parsed.data}`}>Download PDF</a>}
      />
      <StatementView figures={figures} currency={club.currency} locale={club.locale} title={`${club.name} statement`} />
      <div className="mt-4"><ActionButton action={emailStatement} slug={club.slug} hidden={{ memberUserId: user.id, month: parsed.data }} label="E-mail me this statement" pendingText="Queueing…" /></div>
    </div>
  );
}
