import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { TemplateForm } from "@/components/preflight/template-form";
import { ProfileForm } from "@/components/tools/profile-form";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getAircraft } from "@/db/queries/fleet";
import { getPreflightTemplate } from "@/db/queries/tools-preflight";
import { getWeightBalanceProfile } from "@/db/queries/tools-wb";
import { unitsOf } from "@/lib/bookings/loading";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Aircraft figures and checklist" };
export const dynamic = "force-dynamic";

const corners = (pts: [number, number][] | null | undefined) => (pts ?? []).map(([a, w]) => `${a}, ${w}`).join("\n");

export default async function AircraftToolsSetupPage({ params }: { params: Promise<{ club: string; aircraftId: string }> }) {
  const { club: slug, aircraftId } = await params;
  const { db, club } = await authorizePage(slug, ["update", "Aircraft"]);
  const plane = getAircraft(db, club.id, aircraftId);
  if (!plane || plane.retiredAt) notFound();
  const p = getWeightBalanceProfile(db, club.id, plane.id);
  const t = getPreflightTemplate(db, club.id, plane.id);
  const units = unitsOf(club.unitSystem);
  const num = (n: number | null | undefined) => (n === null || n === undefined ? "" : String(n));
  return (
    <div className="max-w-5xl">
      <PageHeader title={`${plane.registration} · figures and checklist`} lead={`${plane.make} ${plane.model}. Units follow the club: ${units.weight}, ${units.arm}, ${units.fuel}.`} actions={<Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/tools`}>← Pilot tools</Link>} />
      <div className="grid gap-4 lg:grid-cols-2">
        <section className="card" aria-labelledby="wb-h">
          <h2 id="wb-h" className="mb-3 text-lg font-bold">Weight and balance</h2>
          <ProfileForm
            slug={club.slug}
            aircraftId={plane.id}
            units={units}
            unitSystem={club.unitSystem}
            locale={club.locale}
            defaults={{
              emptyWeight: num(p?.emptyWeight), emptyArm: num(p?.emptyArm), maxTakeoffWeight: num(p?.maxTakeoffWeight), maxLandingWeight: num(p?.maxLandingWeight),
              fuelKind: p?.fuelKind ?? "avgas", burnPerHour: num(p?.burnPerHour),
              stations: (p?.stations ?? []).map((s) => `${s.name} | ${s.arm}${s.maxWeight !== null ? ` | ${s.maxWeight}` : ""}`).join("\n"),
              tanks: (p?.tanks ?? []).map((k) => `${k.name} | ${k.arm} | ${k.usableCapacity}`).join("\n"),
              envelopeNormal: corners(p?.envelopeNormal), envelopeUtility: corners(p?.envelopeUtility), source: p?.source ?? "",
            }}
          />
        </section>
        <section className="card" aria-labelledby="pf-h">
          <h2 id="pf-h" className="mb-3 text-lg font-bold">Preflight checklist</h2>
          <TemplateForm
            slug={club.slug}
            aircraftId={plane.id}
            oilUnit={club.unitSystem === "metric" ? "L" : "qt"}
            fuelUnit={club.unitSystem === "metric" ? "L" : "US gal"}
            defaults={{
              fuelTanks: (t?.fuelTanks ?? []).map((k) => `${k.name} | ${k.capacity}`).join("\n"),
              documents: (t?.items ?? []).filter((i) => i.kind === "document").map((i) => i.label).join("\n"),
              checklist: (t?.items ?? []).filter((i) => i.kind === "check").map((i) => `${i.section}: ${i.label}`).join("\n"),
              sumpPoints: (t?.sumpPoints ?? []).join("\n"), oilMinimum: num(t?.oilMinimum), oilMaximum: num(t?.oilMaximum),
            }}
          />
        </section>
      </div>
    </div>
  );
}
