import { Field, SelectField } from "@/components/ui/field";
import { unitsOf } from "@/lib/bookings/loading";

type Station = { key: string; name: string; arm: number; maxWeight: number | null };
type Tank = { key: string; name: string; arm: number; usableCapacity: number };

/**
 * The loading inputs, shared by the booking form (a server action) and the quick calculator
 * (a GET form). Keys travel in hidden fields beside each value, in the profile's order.
 */
export function LoadingFields({ unitSystem, stations, tanks, hasUtility, values, errors = {} }: {
  unitSystem: "imperial" | "metric";
  stations: Station[];
  tanks: Tank[];
  hasUtility: boolean;
  values: { stationWeights: Record<string, number>; fuelVolumes: Record<string, number>; burnVolume: number; category: string };
  errors?: Record<string, string[]>;
}) {
  const u = unitsOf(unitSystem);
  return (
    <>
      {hasUtility ? (
        <SelectField label="Category" name="category" defaultValue={values.category} errors={errors.category}>
          <option value="normal">Normal</option>
          <option value="utility">Utility</option>
        </SelectField>
      ) : <input type="hidden" name="category" value="normal" />}
      <fieldset className="mb-2">
        <legend className="mb-2 font-bold">People and baggage ({u.weight})</legend>
        <div className="grid gap-x-3 sm:grid-cols-2">
          {stations.map((s, i) => (
            <div key={s.key}>
              <input type="hidden" name="stationKey[]" value={s.key} />
              <Field id={`station-${s.key}`} label={`${s.name} (${u.weight})`} name="stationWeight[]" inputMode="decimal" defaultValue={String(values.stationWeights[s.key] ?? 0)} errors={errors[`stationWeight.${i}`]} hint={`Arm ${s.arm} ${u.arm}${s.maxWeight !== null ? `, limit ${s.maxWeight} ${u.weight}` : ""}`} />
            </div>
          ))}
        </div>
      </fieldset>
      <fieldset className="mb-2">
        <legend className="mb-2 font-bold">Fuel ({u.fuel})</legend>
        <div className="grid gap-x-3 sm:grid-cols-2">
          {tanks.map((t, i) => (
            <div key={t.key}>
              <input type="hidden" name="tankKey[]" value={t.key} />
              <Field id={`tank-${t.key}`} label={`${t.name} (${u.fuel})`} name="tankVolume[]" inputMode="decimal" defaultValue={String(values.fuelVolumes[t.key] ?? 0)} errors={errors[`tankVolume.${i}`]} hint={`Usable ${t.usableCapacity} ${u.fuel}, arm ${t.arm} ${u.arm}`} />
            </div>
          ))}
        </div>
        <Field label={`Planned fuel burn (${u.fuel})`} name="burnVolume" inputMode="decimal" defaultValue={String(values.burnVolume)} errors={errors.burnVolume} hint="Taken off the tanks for the landing point." />
      </fieldset>
    </>
  );
}
