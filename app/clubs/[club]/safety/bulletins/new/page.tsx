import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { BulletinForm, type BulletinFormValues } from "@/components/safety/bulletin-form";
import { PageHeader } from "@/components/ui/page-header";
import { getBulletin } from "@/db/queries/safety-bulletins";
import { listFleetTypeGroups } from "@/db/queries/safety-checkouts";
import { getReport } from "@/db/queries/safety-reports";
import { isoDateInTimeZone } from "@/lib/dates";
import { canTriageReports } from "@/lib/safety/report-access";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "New bulletin" };

export default async function NewBulletinPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<{ revise?: string; fromReport?: string }> }) {
  const { club: slug } = await params;
  const sp = await searchParams;
  const { db, club, ability } = await authorizePage(slug, ["create", "Bulletin"]);
  let initial: Partial<BulletinFormValues> = {};
  let supersedesId: string | undefined;
  let sourceReportId: string | undefined;
  let lead = "Write the bulletin, choose who it is for, then publish it — every member of the audience gets it by e-mail and is asked to acknowledge it.";
  if (sp.revise) {
    const previous = getBulletin(db, club.id, sp.revise);
    if (!previous || previous.status !== "published") notFound();
    if (previous.supersededAt) notFound();
    initial = { ...previous };
    supersedesId = previous.id;
    lead = `A revision of version ${previous.version}. Published bulletins are never edited: this becomes version ${previous.version + 1}, and version ${previous.version} stays on record.`;
  } else if (sp.fromReport && canTriageReports(ability)) {
    const report = getReport(db, club.id, sp.fromReport);
    if (!report) notFound();
    sourceReportId = report.id;
    initial = {
      title: "Lesson from a safety report",
      bodyMarkdown: `A member reported the following (${report.occurredOn}, ${report.location}).\n\n${report.whatHappened}\n\n**What we can learn:** …`,
      urgency: "priority",
    };
    lead = "A draft from a safety report. Remove anything that could identify the reporter or others before publishing.";
  }
  return (
    <div className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href={`/clubs/${club.slug}/safety`}>← Safety</Link></p>
      <PageHeader title={supersedesId ? "Revise bulletin" : "New bulletin"} lead={lead} />
      <BulletinForm
        slug={club.slug}
        typeGroups={listFleetTypeGroups(db, club.id)}
        canPublish={can(ability, "publish", "Bulletin")}
        initial={initial}
        supersedesId={supersedesId}
        sourceReportId={sourceReportId}
        today={isoDateInTimeZone(new Date(), club.timeZone)}
      />
    </div>
  );
}
