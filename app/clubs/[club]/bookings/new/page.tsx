import type { Metadata } from "next";
import { BookingForm } from "@/components/bookings/booking-form";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { getFlightLine } from "@/db/queries/fleet-status";
import { listMembers } from "@/db/queries/members";
import { addDays, isIsoDate, isoDateInTimeZone } from "@/lib/dates";
import { STATUS_WORDS } from "@/lib/fleet/status-words";
import { explainDenied, can, canAll } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "New booking" };
export const dynamic = "force-dynamic";

export default async function NewBookingPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "Booking"]);
  const query = await searchParams;
  const line = getFlightLine(db, club);
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const date = query.date && isIsoDate(query.date) && query.date >= today ? query.date : addDays(today, 1);
  const aircraftId = line.entries.some((e) => e.aircraft.id === query.aircraft) ? query.aircraft! : "";
  // A "Book" link from a free window carries its start and end (club time, "YYYY-MM-DDTHH:MM").
  const localOk = (v: string | undefined): v is string => typeof v === "string" && /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(v) && isIsoDate(v.slice(0, 10));
  const startsAt = localOk(query.start) ? query.start : `${date}T09:00`;
  const twoHoursOn = (local: string) => `${local.slice(0, 11)}${String(Math.min(23, Number(local.slice(11, 13)) + 2)).padStart(2, "0")}${local.slice(13)}`;
  const endsAt = localOk(query.end) && query.end > startsAt ? query.end : twoHoursOn(startsAt);
  const people = listMembers(db, club.id).filter((m) => m.status === "active" && !(m.roles.length === 1 && m.roles[0] === "mechanic"));
  // Instructors include the person booking: an instructor books a student with themselves aboard.
  const instructors = people.filter((m) => m.roles.includes("instructor")).map((m) => ({ id: m.userId, label: m.userId === user.id ? `${m.name ?? m.email} (you)` : m.name ?? m.email }));
  const forOthers = canAll(ability, "update", "Booking"); // instructors book for any member
  return (
    <div className="max-w-2xl">
      <PageHeader title="New booking" lead={`Times are ${club.name}'s own (${club.timeZone}). The booking is checked against the aircraft's records and yours.`} />
      <div className="mb-4"><SafetyCaution compact /></div>
      {can(ability, "create", "Booking") ? (
        <section className="card">
          <BookingForm
            slug={club.slug}
            aircraft={line.entries.map((e) => ({ id: e.aircraft.id, label: `${e.aircraft.registration} — ${e.aircraft.make} ${e.aircraft.model} (${STATUS_WORDS[e.status]})` }))}
            instructors={instructors}
            members={forOthers ? people.filter((m) => m.userId !== user.id).map((m) => ({ id: m.userId, label: m.name ?? m.email })) : null}
            defaults={{ aircraftId, startsAt, endsAt, instructorId: instructors.some((i) => i.id === query.instructor) ? query.instructor! : "" }}
          />
        </section>
      ) : (
        <p className="text-ink-500">{explainDenied("create", "Booking")}</p>
      )}
    </div>
  );
}
