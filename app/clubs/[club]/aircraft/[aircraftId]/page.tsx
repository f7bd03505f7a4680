import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AircraftForm } from "@/components/fleet/aircraft-form";
import { CompletionHistory } from "@/components/fleet/completion-history";
import { DueView } from "@/components/fleet/due-view";
import { FlightsTable } from "@/components/fleet/flights-table";
import { LogFlightForm } from "@/components/fleet/flight-forms";
import { CreateItemForm, MeterConversionForm, RecordCompletionForm, UpdateItemForm } from "@/components/fleet/inspection-forms";
import { IssueNoticeForm } from "@/components/fleet/notice-forms";
import { NoticeList } from "@/components/fleet/notice-list";
import { ReportSquawkForm } from "@/components/fleet/squawk-forms";
import { SquawkList } from "@/components/fleet/squawk-list";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge } from "@/components/ui/status-badge";
import { getAircraft, listCompletionHistory, listItems, listUploadsFor } from "@/db/queries/fleet";
import { listFlights } from "@/db/queries/fleet-flights";
import { listNotices } from "@/db/queries/fleet-notices";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { listSquawkEvents, listSquawks } from "@/db/queries/fleet-squawks";
import { minorToDecimalString, currencyExponent, formatMoney } from "@/lib/money";
import { explainDenied, can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Aircraft" };
export const dynamic = "force-dynamic";

function Section({ id, title, children }: { id: string; title: string; children: React.ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-h`} className="mt-8 scroll-mt-4">
      <h2 id={`${id}-h`} className="mb-3 text-xl font-bold">{title}</h2>
      {children}
    </section>
  );
}

export default async function AircraftPage({ params }: { params: Promise<{ club: string; aircraftId: string }> }) {
  const { club: slug, aircraftId } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Aircraft"]);
  const plane = getAircraft(db, club.id, aircraftId);
  const entry = plane ? getAircraftStatusEntry(db, club, plane.id) : undefined;
  if (!plane || !entry) notFound();

  const may = {
    report: can(ability, "create", "Squawk"),
    triage: can(ability, "triage", "Squawk"),
    close: can(ability, "close", "Squawk"),
    record: can(ability, "record", "Inspection"),
    addItem: can(ability, "create", "Inspection"),
    editItem: can(ability, "update", "Inspection"),
    issue: can(ability, "create", "GroundingNotice"),
    lift: can(ability, "lift", "GroundingNotice"),
    readFlights: can(ability, "read", "Flight"),
    logFlight: can(ability, "create", "Flight"),
    edit: can(ability, "update", "Aircraft"),
  };
  const squawks = listSquawks(db, club.id, { aircraftId: plane.id, limit: 100 });
  const events = listSquawkEvents(db, club.id, squawks.map((s) => s.id));
  const squawkFiles = listUploadsFor(db, club.id, "Squawk", squawks.map((s) => s.id));
  const notices = listNotices(db, club.id, { aircraftId: plane.id, limit: 50 });
  const flights = may.readFlights ? listFlights(db, club.id, { aircraftId: plane.id, limit: 25 }) : [];
  const history = listCompletionHistory(db, club.id, plane.id, 60);
  const completionFiles = listUploadsFor(db, club.id, "InspectionCompletion", history.map((c) => c.id));
  const items = may.record || may.editItem ? listItems(db, club.id, plane.id) : [];
  const dueKeys = new Set(entry.due.map((d) => d.key));
  const meterNow = plane.maintenanceMeter === "hobbs" ? plane.currentHobbs : plane.currentTach;
  const open = squawks.filter((s) => s.status === "open");
  const closed = squawks.filter((s) => s.status === "closed");
  const base = `/clubs/${club.slug}`;

  return (
    <div className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href={`${base}/flight-line`} className="tap">← Flight line</Link></p>
      <PageHeader title={plane.registration} lead={`${plane.make} ${plane.model} · ${plane.category}, ${plane.classRating}${plane.tailwheel ? ", tailwheel" : ""}${plane.homeField ? ` · ${plane.homeField}` : ""}`} actions={<StatusBadge status={entry.status} large />} />
      <SafetyCaution compact />

      <div className="mt-4 grid gap-4 md:grid-cols-[1fr_auto]">
        <section aria-labelledby="reasons-h" className="card min-w-0">
          <h2 id="reasons-h" className="mb-2 text-lg font-bold">Why this status</h2>
          {entry.reasons.length === 0 ? <p>No open squawks, notices or due items on record.</p> : (
            <ul className="space-y-1">
              {entry.reasons.map((r, i) => <li key={i} className={r.grounding ? "font-bold text-plum-800" : ""}>{r.grounding ? "■ " : "• "}{r.grounding ? <span className="sr-only">Grounding reason: </span> : null}{r.text}</li>)}
            </ul>
          )}
          <p className="mt-3 font-mono text-sm tabular text-ink-700">Hobbs {plane.currentHobbs?.toFixed(1) ?? "missing record"} · Tach {plane.currentTach?.toFixed(1) ?? "missing record"} · inspections count {plane.maintenanceMeter}</p>
        </section>
        {plane.photoUploadId ? (
          <img src={`/api/clubs/${club.slug}/uploads/${plane.photoUploadId}`} alt={`Photo of ${plane.registration}`} className="h-40 w-full rounded border border-sand-300 object-cover md:w-60" />
        ) : null}
      </div>

      <Section id="report" title="Report a squawk">
        <div className="card">{may.report ? <ReportSquawkForm slug={club.slug} aircraftId={plane.id} registration={plane.registration} /> : <p className="text-sm text-ink-500">{explainDenied("create", "Squawk")}</p>}</div>
      </Section>

      <Section id="due" title="What comes due">
        <DueView due={entry.due} caption={`Inspection items of ${plane.registration}`} meterNow={plane.maintenanceMeter} />
        {may.record || may.editItem ? (
          <div className="mt-3 space-y-2">
            {items.filter((i) => dueKeys.has(i.key)).map((item) => {
              const otherMeter = entry.due.find((d) => d.key === item.key && d.otherMeter);
              return (
              <details key={item.id} className="rounded border border-sand-300 bg-white p-3">
                <summary className="cursor-pointer font-bold text-fin-600">Record or update: {item.name}</summary>
                <div className="mt-3 grid gap-4 md:grid-cols-2">
                  {may.record ? <RecordCompletionForm slug={club.slug} itemId={item.id} itemName={item.name} today={entry.today} hoursBased={item.ruleKind === "hours" || item.ruleKind === "months-or-hours"} fixedDate={item.ruleKind === "fixed-date"} meterName={plane.maintenanceMeter} meterNow={meterNow} /> : null}
                  {may.editItem && (item.usageLimitHours !== null || item.origin !== "regulation") ? <UpdateItemForm slug={club.slug} itemId={item.id} hasUsage={item.usageLimitHours !== null} canRetire={item.origin !== "regulation"} /> : null}
                  {may.record && otherMeter?.otherMeter ? <MeterConversionForm slug={club.slug} itemId={item.id} itemName={item.name} fromMeter={otherMeter.otherMeter.completionMeter} toMeter={otherMeter.otherMeter.currentMeter} lastHours={otherMeter.lastDoneHours} /> : null}
                </div>
              </details>
              );
            })}
          </div>
        ) : null}
        {may.addItem ? (
          <details className="mt-3 rounded border border-sand-300 bg-white p-3">
            <summary className="cursor-pointer font-bold text-fin-600">Add a directive or club item</summary>
            <div className="mt-3"><CreateItemForm slug={club.slug} aircraftId={plane.id} /></div>
          </details>
        ) : null}
      </Section>

      <Section id="squawks" title={`Squawks (${open.length} open)`}>
        <SquawkList slug={club.slug} locale={club.locale} timeZone={club.timeZone} rows={open} events={events} files={squawkFiles} today={entry.today} canTriage={may.triage} canClose={may.close} />
        {closed.length ? (
          <details className="mt-3">
            <summary className="cursor-pointer font-bold text-fin-600">Closed squawks ({closed.length})</summary>
            <div className="mt-2"><SquawkList slug={club.slug} locale={club.locale} timeZone={club.timeZone} rows={closed} events={events} files={squawkFiles} today={entry.today} canTriage={false} canClose={false} /></div>
          </details>
        ) : null}
      </Section>

      <Section id="notices" title="Grounding notices">
        <NoticeList slug={club.slug} rows={notices} timeZone={club.timeZone} canLift={may.lift} />
        {may.issue ? (
          <details className="mt-3 rounded border border-sand-300 bg-white p-3">
            <summary className="cursor-pointer font-bold text-stop-800">Ground {plane.registration}</summary>
            <div className="mt-3"><IssueNoticeForm slug={club.slug} aircraftId={plane.id} registration={plane.registration} defaultCategory={can(ability, "update", "Aircraft") || can(ability, "record", "Inspection") ? "maintenance" : "safety"} /></div>
          </details>
        ) : null}
      </Section>

      {may.readFlights ? (
        <Section id="flights" title="Flights">
          {may.logFlight ? (
            <details className="mb-3 rounded border border-sand-300 bg-white p-3">
              <summary className="cursor-pointer font-bold text-fin-600">Log a flight in {plane.registration}</summary>
              <div className="mt-3"><LogFlightForm slug={club.slug} aircraft={[{ id: plane.id, registration: plane.registration, hobbs: plane.currentHobbs, tach: plane.currentTach }]} fixedAircraftId={plane.id} today={entry.today} metric={club.unitSystem === "metric"} /></div>
            </details>
          ) : null}
          <FlightsTable rows={flights} showAircraft={false} locale={club.locale} />
          <p className="mt-2 text-sm"><Link href={`${base}/flights?aircraft=${plane.id}`}>The whole flight log of {plane.registration}</Link></p>
        </Section>
      ) : null}

      <Section id="history" title="Inspection history">
        <CompletionHistory slug={club.slug} locale={club.locale} rows={history} files={completionFiles} due={entry.due} />
      </Section>

      <Section id="record" title="Aircraft record">
        <dl className="card grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
          <div><dt className="inline font-bold">Type group: </dt><dd className="inline">{plane.typeGroup}</dd></div>
          <div><dt className="inline font-bold">Serial, year: </dt><dd className="inline">{plane.serialNumber ?? "—"}, {plane.year ?? "—"}</dd></div>
          <div><dt className="inline font-bold">Rate: </dt><dd className="inline">{formatMoney(plane.hourlyRateMinor, club.currency, club.locale)} per {plane.rateMeter} hour</dd></div>
          <div><dt className="inline font-bold">Engine: </dt><dd className="inline">{plane.engineTimeSinceOverhaul ?? "—"} h since overhaul of {plane.engineTboHours ?? "—"} h TBO</dd></div>
          <div><dt className="inline font-bold">Rules: </dt><dd className="inline">{[plane.usedForInstruction && "instruction", plane.usedForHire && "hire", plane.ifrEquipped && "IFR-equipped", plane.usedForIfr && "IFR use"].filter(Boolean).join(", ") || "private VFR"}</dd></div>
        </dl>
        {may.edit ? (
          <details className="mt-3 rounded border border-sand-300 bg-white p-3">
            <summary className="cursor-pointer font-bold text-fin-600">Edit the record</summary>
            <div className="mt-3">
              <AircraftForm slug={club.slug} currency={club.currency} locale={club.locale} values={{ ...plane, hourlyRate: minorToDecimalString(plane.hourlyRateMinor, currencyExponent(club.currency)) }} />
            </div>
          </details>
        ) : null}
      </Section>
    </div>
  );
}
