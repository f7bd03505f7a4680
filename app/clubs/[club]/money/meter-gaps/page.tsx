import type { Metadata } from "next";
import { Day, dayText } from "@/components/ui/day";
import { ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { PageHeader } from "@/components/ui/page-header";
import { listMeterGaps, listUnchargedFlights } from "@/db/queries/flight-record";
import { settleMeterGapAction } from "@/lib/actions/money/settle-meter-gap";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Meter gaps" };

// Flights whose meters did not continue from the aircraft's previous flight (time nobody may
// have paid for, or time billed twice), until the treasurer settles each one; and flights with
// no charge in the journal at all.
export default async function MeterGapsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const canSettle = can(ability, "create", "Ledger");
  const gaps = listMeterGaps(db, club.id);
  const uncharged = listUnchargedFlights(db, club.id);
  return (
    <>
      <PageHeader title="Meter gaps and uncharged flights" lead="Each flight whose Hobbs or tach did not continue from the aircraft's previous flight stays here until you settle it: charge the time by an adjustment on the journal page, or accept the explanation." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/meter-gaps`} />
      <section aria-labelledby="gaps-h" className="mb-8">
        <h2 id="gaps-h" className="mb-3 text-lg font-bold">Unsettled meter gaps ({gaps.length})</h2>
        {gaps.length === 0 ? (
          <p className="text-ink-700">✓ No unsettled meter gaps.</p>
        ) : (
          <ul className="grid gap-4">
            {gaps.map((g) => (
              <li key={g.flightId} className="card">
                <p className="font-bold">
                  <span aria-hidden="true">▲ </span>
                  {g.continuity === "gap" ? "Gap" : "Overlap"} · {g.registration} · flown <Day date={g.flownOn} locale={club.locale} /> by {g.pilotName}
                </p>
                <p className="text-sm text-ink-700">{g.continuityText}</p>
                <p className="text-sm">
                  <span className="font-bold">Pilot&apos;s explanation: </span>
                  {g.meterExplanation ?? <span className="font-bold text-stop-800">none given (entered before explanations were asked for)</span>}
                </p>
                {g.maintenanceNote ? <p className="text-sm"><span className="font-bold">Maintenance found: </span>{g.maintenanceNote}</p> : null}
                {canSettle ? (
                  <div className="mt-2 max-w-xl">
                    <ActionForm
                      action={settleMeterGapAction}
                      slug={club.slug}
                      label={`Settle the meter gap of ${g.registration} on ${dayText(g.flownOn, club.locale)}`}
                      submitLabel="Settle"
                      hidden={{ flightId: g.flightId }}
                      fields={[{ name: "note", label: "What was decided", placeholder: "0.5 h charged to the previous pilot" }]}
                    />
                  </div>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="unch-h">
        <h2 id="unch-h" className="mb-3 text-lg font-bold">Flights without a charge ({uncharged.length})</h2>
        {uncharged.length === 0 ? (
          <p className="text-ink-700">✓ Every flight in the log has its charge in the journal.</p>
        ) : (
          <table className="w-full text-sm">
            <thead><tr className="text-left"><th className="py-1">Flown</th><th className="py-1">Aircraft</th><th className="py-1">Pilot</th><th className="py-1">Hobbs</th></tr></thead>
            <tbody>
              {uncharged.map((f) => (
                <tr key={f.flightId} className="border-t border-sand-200">
                  <td className="py-1"><Day date={f.flownOn} locale={club.locale} /></td><td className="py-1">{f.registration}</td><td className="py-1">{f.pilotName}</td>
                  <td className="py-1 font-mono">{f.hobbsOut.toFixed(1)} → {f.hobbsIn.toFixed(1)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </>
  );
}
