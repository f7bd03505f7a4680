import { scrollArea } from "@/components/ui/scroll-area";
import { Day } from "@/components/ui/day";
import type { Metadata } from "next";
import { CurrencyList } from "@/components/currency/currency-list";
import { DocumentForm } from "@/components/documents/document-form";
import { DocumentsList } from "@/components/documents/documents-list";
import { MedicalForm } from "@/components/documents/medical-form";
import { OutsideFlightForm } from "@/components/documents/outside-flight-form";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { getMemberCurrency } from "@/db/queries/currency";
import { listCheckouts, listFleetTypeGroups, listOutsideFlights } from "@/db/queries/safety-checkouts";
import { getCurrentMedical, getOwnBirthDate, listMemberDocuments } from "@/db/queries/safety-documents";
import { medicalPrivilegeDates, type MedicalPrivilege } from "@/lib/currency";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePage, ownRecord } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "My currency & documents" };

const PRIVILEGE_WORDS: Record<MedicalPrivilege, string> = {
  atp: "Airline transport pilot privileges",
  commercial: "Commercial pilot privileges",
  private: "Private pilot privileges",
};

export default async function MePage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ownRecord("read", "Currency"));
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const currency = getMemberCurrency(db, club, user.id, today);
  const docs = listMemberDocuments(db, club.id, user.id);
  const medical = getCurrentMedical(db, club.id, user.id);
  const birthDate = getOwnBirthDate(db, club.id, user.id);
  const mine = listCheckouts(db, club.id, { userId: user.id, includeRevoked: true });
  const outside = listOutsideFlights(db, club.id, user.id);
  const typeGroups = listFleetTypeGroups(db, club.id);
  // 14 CFR 61.23(d): a first or second class lasts for each privilege it carries to its own date.
  const cls = medical?.kind === "faa_class" ? medical.medicalClass : null;
  const privilegeDates = medical && birthDate && (cls === 1 || cls === 2 || cls === 3)
    ? medicalPrivilegeDates({ medicalClass: cls, examDate: medical.examDate, birthDate })
    : null;
  return (
    <div className="max-w-5xl">
      <PageHeader title="My currency & documents" lead={`As of ${today}. Computed from the club's flight log and the flights you add from elsewhere. You stay responsible for your own currency.`} />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      <div className="grid gap-6 lg:grid-cols-2">
        <section className="card min-w-0" aria-labelledby="currency-h">
          <h2 id="currency-h" className="mb-2 text-lg font-bold">Currency</h2>
          <CurrencyList items={currency.items} />
          {currency.next ? <p className="mt-3 text-sm text-ink-700">Next to end: <strong>{currency.next.label}</strong> after {currency.next.lastDay}.</p> : null}
        </section>
        <section className="card min-w-0" aria-labelledby="checkouts-h">
          <h2 id="checkouts-h" className="mb-2 text-lg font-bold">My checkouts</h2>
          {mine.length === 0 ? <p className="text-ink-500">No checkouts yet. Ask an instructor.</p> : null}
          <ul className="divide-y divide-sand-200">
            {mine.map((c) => (
              <li key={c.id} className="py-2">
                <span className="font-bold">{c.typeGroup}</span> · since <Day date={c.checkedOutOn} locale={club.locale} /> · {c.instructorName ?? "instructor"}
                {c.conditions ? <span className="block text-sm text-ink-700">Conditions: {c.conditions}</span> : null}
                {c.revokedAt ? <span className="block text-sm font-bold text-stop-800">Revoked <Day date={isoDateInTimeZone(c.revokedAt, club.timeZone)} locale={club.locale} />: {c.revokeReason}</span> : null}
              </li>
            ))}
          </ul>
        </section>
        <section className="card min-w-0" aria-labelledby="medical-h">
          <h2 id="medical-h" className="mb-2 text-lg font-bold">Medical</h2>
          {medical ? (
            <dl className="mb-4 grid grid-cols-2 gap-2 text-sm">
              <dt className="font-bold">Kind</dt><dd>{medical.kind === "basicmed" ? "BasicMed" : `Class ${medical.medicalClass}`}</dd>
              <dt className="font-bold">Exam</dt><dd className="tabular"><Day date={medical.examDate} locale={club.locale} /></dd>
              {medical.courseDate ? <><dt className="font-bold">Course</dt><dd className="tabular"><Day date={medical.courseDate} locale={club.locale} /></dd></> : null}
              {privilegeDates ? privilegeDates.map((p) => (
                <div key={p.privilege} className="contents" data-privilege={p.privilege}>
                  <dt className="font-bold">{PRIVILEGE_WORDS[p.privilege]} through</dt><dd className="tabular"><Day date={p.lastDay} locale={club.locale} /></dd>
                </div>
              )) : <><dt className="font-bold">{medical.kind === "basicmed" ? "Expires after" : "Private pilot privileges expire after"}</dt><dd className="tabular"><Day date={medical.expiresOn} locale={club.locale} /></dd></>}
              <dt className="font-bold">Standing</dt><dd>{medical.verifiedAt ? "✓ Verified" : "◇ Claimed: counts once an instructor or the safety officer has seen the certificate"}</dd>
              {medical.limitations ? <><dt className="font-bold">Limitations</dt><dd>{medical.limitations}</dd></> : null}
              {birthDate ? <><dt className="font-bold">Date of birth (only you see it)</dt><dd className="tabular"><Day date={birthDate} locale={club.locale} /></dd></> : null}
            </dl>
          ) : <p className="mb-3 text-ink-500">No medical recorded.</p>}
          <p className="mb-3 text-sm text-ink-700">The safety officer and instructors see only the date it expires; club admins see the details; only you see your date of birth.</p>
          <details>
            <summary className="cursor-pointer font-bold text-fin-600">Record a medical</summary>
            <div className="mt-3"><MedicalForm slug={club.slug} today={today} hasBirthDate={birthDate !== null} /></div>
          </details>
        </section>
        <section className="card min-w-0" aria-labelledby="docs-h">
          <h2 id="docs-h" className="mb-2 text-lg font-bold">Documents</h2>
          <DocumentsList slug={club.slug} locale={club.locale} docs={docs} today={today} warnDays={club.settings.documentReminderDays} />
          <details className="mt-3">
            <summary className="cursor-pointer font-bold text-fin-600">Record a document</summary>
            <div className="mt-3"><DocumentForm slug={club.slug} today={today} /></div>
          </details>
        </section>
        <section className="card min-w-0 lg:col-span-2" aria-labelledby="outside-h">
          <h2 id="outside-h" className="mb-2 text-lg font-bold">Flights from elsewhere</h2>
          <p className="mb-3 text-sm text-ink-700">Landings you made outside this club (another club, a rental) count toward your passenger currency in the same category and class once an instructor or the safety officer has verified them against your logbook. Until then they show as claimed.</p>
          {outside.length ? (
            <div className="mb-4 overflow-x-auto" {...scrollArea("Currency")}>
              <table className="w-full min-w-[30rem] text-left text-sm">
                <thead className="bg-sand-200"><tr><th scope="col" className="px-3 py-2">Date</th><th scope="col" className="px-3 py-2">Aircraft</th><th scope="col" className="px-3 py-2">Day</th><th scope="col" className="px-3 py-2">Night full stop</th><th scope="col" className="px-3 py-2">Class</th><th scope="col" className="px-3 py-2">Standing</th></tr></thead>
                <tbody>
                  {outside.map((o) => (
                    <tr key={o.id} className="border-t border-sand-200"><td className="whitespace-nowrap px-3 py-2 font-mono tabular">{o.flownOn}</td><td className="px-3 py-2">{o.aircraftDescription}{o.typeGroup ? ` (${o.typeGroup})` : ""}</td><td className="px-3 py-2 tabular">{o.dayLandings}</td><td className="px-3 py-2 tabular">{o.nightFullStopLandings}</td><td className="px-3 py-2">{o.category && o.classRating ? `${o.category}, ${o.classRating}${o.tailwheel ? ", tailwheel" : ""}` : "Not recorded (counts toward no class)"}</td><td className="px-3 py-2">{o.verifiedAt ? "✓ Verified" : "◇ Claimed"}</td></tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          <details>
            <summary className="cursor-pointer font-bold text-fin-600">Add a flight from elsewhere</summary>
            <div className="mt-3"><OutsideFlightForm slug={club.slug} today={today} typeGroups={typeGroups} /></div>
          </details>
        </section>
      </div>
    </div>
  );
}
