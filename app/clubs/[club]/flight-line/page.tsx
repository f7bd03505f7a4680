import type { Metadata } from "next";
import Link from "next/link";
import { FlightLineBoard } from "@/components/fleet/flight-line-board";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { listBlocksInRange } from "@/db/queries/bookings-schedule";
import { getFlightLine } from "@/db/queries/fleet-status";
import { blockWords } from "@/lib/bookings/block-words";
import { dayBounds } from "@/lib/bookings/grid";
import { formatDateWords } from "@/lib/dates/words";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Flight line" };
export const dynamic = "force-dynamic";

export default async function FlightLinePage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["read", "Aircraft"]);
  const initial = getFlightLine(db, club);
  // Maintenance blocks in force now or later on the club's day, in words beside each aircraft.
  const blockLines: Record<string, string[]> = {};
  for (const b of listBlocksInRange(db, club.id, new Date(initial.generatedAt), new Date(dayBounds(initial.today, club.timeZone).end))) {
    (blockLines[b.aircraftId] ??= []).push(blockWords(b, club.timeZone));
  }
  return (
    <div className="max-w-6xl">
      <PageHeader
        title="Flight line"
        lead={`Every aircraft of ${club.name} with its status and the reasons for it, on ${formatDateWords(initial.today)}.`}
        actions={<Link href={`/clubs/${club.slug}/aircraft`} className={buttonClass("secondary")}>Aircraft records</Link>}
      />
      <div className="mb-4"><SafetyCaution compact /></div>
      <FlightLineBoard slug={club.slug} initial={initial} blockLines={blockLines} />
    </div>
  );
}
