import type { Metadata } from "next";
import { LoadingFields } from "@/components/tools/loading-fields";
import { LoadingResult } from "@/components/tools/loading-result";
import { buttonClass } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { listAircraft } from "@/db/queries/fleet";
import { getWeightBalanceProfile, listWeightBalanceProfiles, toLoadingProfile } from "@/db/queries/tools-wb";
import { zodFieldErrors } from "@/lib/actions/create-action";
import { computeLoading } from "@/lib/bookings/loading";
import { queryToObject, quickLoadingSchema } from "@/lib/validation/tools";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Weight and balance" };
export const dynamic = "force-dynamic";

export default async function WeightBalanceToolPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["read", "Tools"]);
  const query = queryToObject(await searchParams);
  const withFigures = new Set(listWeightBalanceProfiles(db, club.id).map((p) => p.aircraftId));
  const fleet = listAircraft(db, club.id).filter((a) => withFigures.has(a.id));
  const chosen = typeof query.aircraft === "string" ? fleet.find((a) => a.id === query.aircraft) : undefined;
  const profile = chosen ? getWeightBalanceProfile(db, club.id, chosen.id) : undefined;
  const submitted = profile && query.stationKey !== undefined;
  const parsed = submitted ? quickLoadingSchema.safeParse(query) : null;
  const errors = parsed && !parsed.success ? zodFieldErrors(parsed.error) : {};
  let result: ReturnType<typeof computeLoading> | null = null;
  let values = { stationWeights: {} as Record<string, number>, fuelVolumes: Object.fromEntries((profile?.tanks ?? []).map((t) => [t.key, t.usableCapacity])), burnVolume: 0, category: "normal" };
  if (profile && parsed?.success) {
    const stationWeights = Object.fromEntries(parsed.data.stationKey.map((k, i) => [k, parsed.data.stationWeight[i] ?? 0]));
    const fuelVolumes = Object.fromEntries(parsed.data.tankKey.map((k, i) => [k, parsed.data.tankVolume[i] ?? 0]));
    values = { stationWeights, fuelVolumes, burnVolume: parsed.data.burnVolume, category: parsed.data.category };
    result = computeLoading(toLoadingProfile(profile), values as Parameters<typeof computeLoading>[1], club.locale);
  }
  return (
    <div className="max-w-5xl">
      <PageHeader title="Weight and balance" lead="A quick calculation, saved nowhere. To keep it with a booking, open the booking." />
      <div className="mb-4"><SafetyCaution compact /></div>
      <div className="grid gap-4 lg:grid-cols-2">
        <section className="card">
          <form method="get" aria-label="Choose the aircraft" className="mb-4 flex flex-wrap items-end gap-2">
            <div className="min-w-0 flex-1">
              <SelectField label="Aircraft" name="aircraft" defaultValue={chosen?.id ?? ""}>
                <option value="" disabled>Choose an aircraft</option>
                {fleet.map((a) => <option key={a.id} value={a.id}>{a.registration} — {a.make} {a.model}</option>)}
              </SelectField>
            </div>
            <button type="submit" className={`${buttonClass("secondary")} mb-4`}>Use this aircraft</button>
          </form>
          {profile ? (
            <form method="get" aria-label="Loading">
              <input type="hidden" name="aircraft" value={profile.aircraftId} />
              <LoadingFields unitSystem={profile.unitSystem} stations={profile.stations} tanks={profile.tanks} hasUtility={Boolean(profile.envelopeUtility)} values={values} errors={errors} />
              <button type="submit" className={buttonClass("primary")}>Work it out</button>
            </form>
          ) : fleet.length === 0 ? <p className="text-ink-700">No aircraft has weight and balance figures yet.</p> : null}
        </section>
        <section className="card min-w-0">
          {profile && result ? (
            <LoadingResult unitSystem={profile.unitSystem} locale={club.locale} fuelKind={profile.fuelKind} takeoff={result.takeoff} landing={result.landing} problems={result.problems} envelope={profile.envelopeNormal} utility={profile.envelopeUtility ?? null} maxTakeoffWeight={profile.maxTakeoffWeight} maxLandingWeight={profile.maxLandingWeight} />
          ) : (
            <p className="text-ink-700">Choose an aircraft, enter the loading and work it out: both points appear on the envelope here.</p>
          )}
        </section>
      </div>
    </div>
  );
}
