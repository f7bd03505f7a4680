import type { Metadata } from "next";
import Link from "next/link";
import { ReportForm } from "@/components/safety/report-form";
import { PageHeader } from "@/components/ui/page-header";
import { listClubAircraftChoices } from "@/db/queries/safety-reports";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "File a safety report" };

export default async function NewReportPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["create", "SafetyReport"]);
  return (
    <div className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href={`/clubs/${club.slug}/safety`}>← Safety</Link></p>
      <PageHeader title="File a safety report" lead="Something happened, or nearly did? Tell the safety officer so everyone can learn from it. Only the safety officer reads reports." />
      <ReportForm slug={club.slug} aircraft={listClubAircraftChoices(db, club.id)} today={isoDateInTimeZone(new Date(), club.timeZone)} />
    </div>
  );
}
