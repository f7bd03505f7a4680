import type { Metadata } from "next";
import { buttonClass } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { zodFieldErrors } from "@/lib/actions/create-action";
import { densityAltitudeCaution } from "@/lib/bookings/density-caution";
import { densityAltitude, inHgFromHpa, isaTemperatureC, pressureAltitude } from "@/lib/performance";
import { densityToolMetricSchema, densityToolSchema, queryToObject } from "@/lib/validation/tools";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Pressure and density altitude" };
export const dynamic = "force-dynamic";

const ft = (n: number) => `${Math.round(n).toLocaleString("en-US")} ft`;

export default async function DensityAltitudePage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { club } = await authorizePage(slug, ["read", "Tools"]);
  const query = queryToObject(await searchParams);
  const metric = club.unitSystem === "metric";
  const submitted = query.fieldElevation !== undefined;
  const parsed = submitted ? (metric ? densityToolMetricSchema : densityToolSchema).safeParse(query) : null;
  const errors = parsed && !parsed.success ? zodFieldErrors(parsed.error) : {};
  let result: { pa: number; da: number; isa: number; caution: ReturnType<typeof densityAltitudeCaution> } | null = null;
  if (parsed?.success) {
    const d = parsed.data as { fieldElevation: number; oat: number; altimeter?: number; qnh?: number };
    const setting = metric ? inHgFromHpa(d.qnh!) : d.altimeter!;
    const pa = pressureAltitude(d.fieldElevation, setting);
    const da = densityAltitude(pa, d.oat);
    result = { pa, da, isa: isaTemperatureC(pa), caution: densityAltitudeCaution(da, d.fieldElevation) };
  }
  const text = (k: string) => (typeof query[k] === "string" ? (query[k] as string) : "");
  const tone = result?.caution.level === "high" ? "border-stop-600 bg-stop-100" : result?.caution.level === "raised" ? "border-sock-500 bg-sock-100" : "border-fin-500 bg-sand-50";
  return (
    <div className="max-w-3xl">
      <PageHeader title="Pressure and density altitude" lead="Standard atmosphere (ICAO Doc 7488 / U.S. Standard Atmosphere 1976)." />
      <div className="mb-4"><SafetyCaution compact /></div>
      <div className="grid gap-4 md:grid-cols-2">
        <form method="get" className="card" aria-label="Field conditions" noValidate>
          <Field label="Field elevation (ft)" name="fieldElevation" inputMode="decimal" defaultValue={text("fieldElevation")} errors={errors.fieldElevation} />
          {metric ? (
            <Field label="QNH (hPa)" name="qnh" inputMode="decimal" defaultValue={text("qnh")} errors={errors.qnh} />
          ) : (
            <Field label="Altimeter setting (inHg)" name="altimeter" inputMode="decimal" defaultValue={text("altimeter")} errors={errors.altimeter} />
          )}
          <Field label="Outside air temperature (°C)" name="oat" inputMode="decimal" defaultValue={text("oat")} errors={errors.oat} />
          <button type="submit" className={buttonClass("primary")}>Work it out</button>
        </form>
        <section className="card" aria-label="Altitudes">
          {result ? (
            <div className="space-y-3">
              <dl className="grid grid-cols-2 gap-x-3 gap-y-1 tabular">
                <dt>Pressure altitude</dt><dd className="font-bold">{ft(result.pa)}</dd>
                <dt>Density altitude</dt><dd className="font-bold">{ft(result.da)}</dd>
                <dt>Standard temperature there</dt><dd>{result.isa.toFixed(1)} °C</dd>
              </dl>
              <p role="note" className={`rounded border-l-4 px-3 py-2 text-sm ${tone}`}><strong>{result.caution.level === "normal" ? "Performance" : "▲ Reduced climb and takeoff performance"}:</strong> {result.caution.text}</p>
            </div>
          ) : (
            <p className="text-ink-700">Enter the field&apos;s elevation, the altimeter setting and the temperature.</p>
          )}
        </section>
      </div>
    </div>
  );
}
