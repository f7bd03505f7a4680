import { scrollArea } from "@/components/ui/scroll-area";
import type { Metadata } from "next";
import Link from "next/link";
import { AircraftForm } from "@/components/fleet/aircraft-form";
import { PageHeader } from "@/components/ui/page-header";
import { listAircraft } from "@/db/queries/fleet";
import { formatHours } from "@/lib/airworthiness";
import { formatMoney } from "@/lib/money";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Aircraft" };
export const dynamic = "force-dynamic";

/** The fleet register: the records themselves. Status lives on the flight line. */
export default async function AircraftListPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Aircraft"]);
  const fleet = listAircraft(db, club.id);
  return (
    <div className="max-w-6xl">
      <PageHeader title="Aircraft" lead={<>The club&apos;s aircraft records. For each aircraft&apos;s status, see the <Link href={`/clubs/${club.slug}/flight-line`}>flight line</Link>.</>} />
      <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Aircraft")}>
        <table className="w-full min-w-[44rem] text-left text-sm">
          <thead className="bg-sand-200">
            <tr><th className="px-3 py-2">Registration</th><th className="px-3 py-2">Make and model</th><th className="px-3 py-2">Type group</th><th className="px-3 py-2">Hobbs / tach</th><th className="px-3 py-2">Rate</th><th className="px-3 py-2">Rules</th></tr>
          </thead>
          <tbody>
            {fleet.map((a) => (
              <tr key={a.id} className="border-t border-sand-200">
                <td className="px-3 py-2 font-bold"><Link href={`/clubs/${club.slug}/aircraft/${a.id}`}>{a.registration}</Link></td>
                <td className="px-3 py-2">{a.make} {a.model}</td>
                <td className="px-3 py-2">{a.typeGroup}</td>
                <td className="px-3 py-2 font-mono tabular">{a.currentHobbs !== null ? formatHours(a.currentHobbs) : "—"} / {a.currentTach !== null ? formatHours(a.currentTach) : "—"}</td>
                <td className="px-3 py-2 tabular">{formatMoney(a.hourlyRateMinor, club.currency, club.locale)}/h {a.rateMeter}</td>
                <td className="px-3 py-2">{[a.usedForInstruction || a.usedForHire ? "100-hour" : null, a.ifrEquipped || a.usedForIfr ? "IFR" : null].filter(Boolean).join(", ") || "VFR"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {can(ability, "create", "Aircraft") ? (
        <section className="card mt-6" aria-labelledby="add-h">
          <h2 id="add-h" className="mb-3 text-lg font-bold">Add an aircraft</h2>
          <p className="mb-3 text-sm text-ink-700">It starts with the default inspection items (annual, 100-hour, ELT, ELT battery, transponder, altimeter/static, VOR check, oil change); those that do not apply to its use are left out of its status. It shows &quot;Status unknown&quot;, naming the missing record, until their last completions are recorded.</p>
          <AircraftForm slug={club.slug} currency={club.currency} locale={club.locale} />
        </section>
      ) : null}
    </div>
  );
}
