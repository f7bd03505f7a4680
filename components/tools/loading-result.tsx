import { SafetyCaution } from "@/components/ui/safety-caution";
import { unitsOf } from "@/lib/bookings/loading";
import { DEFAULT_LOCALE, formatNumber } from "@/lib/money/format";
import { fuelDensityNote } from "@/lib/performance";
import { EnvelopeChart } from "./envelope-chart";

type Point = { weight: number; moment: number; cg: number; withinEnvelope: boolean; overweight: boolean };


function Verdict({ label, p, maxWeight, weightUnit, locale }: { label: string; p: Point; maxWeight: number; weightUnit: string; locale: string }) {
  const fmt = (n: number) => formatNumber(n, locale);
  const ok = p.withinEnvelope && !p.overweight;
  return (
    <div className={`rounded border-l-4 px-3 py-2 ${ok ? "border-go-600 bg-go-100" : "border-stop-600 bg-stop-100"}`}>
      <p className="font-bold">{ok ? "● Within limits" : "■ Out of limits"} at {label.toLowerCase()}</p>
      <p className="text-sm tabular">{fmt(p.weight)} {weightUnit} (max {fmt(maxWeight)}) · moment {fmt(p.moment)} · CG {fmt(p.cg)}</p>
      <p className="text-sm">{p.withinEnvelope ? "Inside the envelope." : "Outside the envelope."} {p.overweight ? "Over the maximum weight." : "Not over the maximum weight."}</p>
    </div>
  );
}

/** The computed loading: both points in words, every problem, and the chart. */
export function LoadingResult({ unitSystem, locale = DEFAULT_LOCALE, fuelKind = "avgas", takeoff, landing, problems, envelope, utility, maxTakeoffWeight, maxLandingWeight }: { unitSystem: "imperial" | "metric"; locale?: string; fuelKind?: "avgas" | "jet"; takeoff: Point; landing: Point; problems: string[]; envelope: [number, number][]; utility: [number, number][] | null; maxTakeoffWeight: number; maxLandingWeight: number | null }) {
  const u = unitsOf(unitSystem);
  return (
    <section aria-label="Weight and balance result" className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-2">
        <Verdict label="Takeoff" p={takeoff} maxWeight={maxTakeoffWeight} weightUnit={u.weight} locale={locale} />
        <Verdict label="Landing" p={landing} maxWeight={maxLandingWeight ?? maxTakeoffWeight} weightUnit={u.weight} locale={locale} />
      </div>
      {problems.length ? <ul className="list-disc space-y-1 pl-5 text-sm font-bold text-stop-800">{problems.map((p) => <li key={p}>{p}</li>)}</ul> : null}
      <EnvelopeChart envelope={envelope} utility={utility} takeoff={{ arm: takeoff.cg, weight: takeoff.weight }} landing={{ arm: landing.cg, weight: landing.weight }} units={u} />
      <SafetyCaution compact />
      <p className="text-sm text-ink-700">These figures inform; they do not replace the aircraft&apos;s flight manual and its own weight and balance record. Fuel is converted at the standard weight ({fuelKind === "jet" ? "jet fuel" : "avgas"} {fuelDensityNote(fuelKind, unitSystem, locale)}, FAA-H-8083-25).</p>
    </section>
  );
}
