import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { listAircraft } from "@/db/queries/fleet";
import { listWeightBalanceProfiles } from "@/db/queries/tools-wb";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Pilot tools" };
export const dynamic = "force-dynamic";

export default async function ToolsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Tools"]);
  const base = `/clubs/${club.slug}/tools`;
  const fleet = listAircraft(db, club.id);
  const profiles = new Set(listWeightBalanceProfiles(db, club.id).map((p) => p.aircraftId));
  const canSetUp = can(ability, "update", "Aircraft");
  const tools = [
    { href: `${base}/weight-balance`, title: "Weight and balance", body: "Weight, moment and CG at takeoff and at landing, drawn on the aircraft's envelope." },
    { href: `${base}/fuel`, title: "Fuel and reserve", body: `Endurance against the 14 CFR 91.151 reserve${club.settings.extraReserveMinutes ? ` plus the club's ${club.settings.extraReserveMinutes} minutes` : ""}.` },
    { href: `${base}/density-altitude`, title: "Pressure and density altitude", body: "From the field elevation, the altimeter setting and the temperature." },
  ];
  return (
    <div className="max-w-5xl">
      <PageHeader title="Pilot tools" lead="Planning aids. They inform the pilot in command; the aircraft's flight manual decides." />
      <SafetyCaution />
      <ul className="mt-5 grid gap-4 sm:grid-cols-3">
        {tools.map((t) => (
          <li key={t.href} className="card">
            <h2 className="text-lg font-bold"><Link href={t.href}>{t.title}</Link></h2>
            <p className="mt-1 text-sm text-ink-700">{t.body}</p>
          </li>
        ))}
      </ul>
      <section className="card mt-6" aria-labelledby="fleet-h">
        <h2 id="fleet-h" className="mb-2 text-lg font-bold">Aircraft figures and checklists</h2>
        <ul className="divide-y divide-sand-200">
          {fleet.map((a) => (
            <li key={a.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span><strong>{a.registration}</strong> {a.make} {a.model} <span className="text-sm text-ink-500">· {profiles.has(a.id) ? "weight and balance on file" : "no weight and balance yet"}</span></span>
              <span className="flex gap-3 text-sm">
                {profiles.has(a.id) ? <Link href={`${base}/weight-balance?aircraft=${a.id}`}>Work it out</Link> : null}
                {canSetUp ? <Link href={`${base}/aircraft/${a.id}`}>Set up figures and checklist</Link> : null}
              </span>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
