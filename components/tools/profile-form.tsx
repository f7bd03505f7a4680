"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { saveWeightBalanceProfileAction } from "@/lib/actions/tools/save-weight-balance-profile";
import { DEFAULT_LOCALE } from "@/lib/money/format";
import { fuelDensityNote } from "@/lib/performance";

export type ProfileDefaults = {
  emptyWeight: string; emptyArm: string; maxTakeoffWeight: string; maxLandingWeight: string; fuelKind: string; burnPerHour: string;
  stations: string; tanks: string; envelopeNormal: string; envelopeUtility: string; source: string;
};

export function ProfileForm({ slug, aircraftId, defaults, units, unitSystem = "imperial", locale = DEFAULT_LOCALE }: { slug: string; aircraftId: string; defaults: ProfileDefaults; units: { weight: string; arm: string; fuel: string }; unitSystem?: "imperial" | "metric"; locale?: string }) {
  const form = useFormAction(saveWeightBalanceProfileAction);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Weight and balance figures">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label={`Empty weight (${units.weight})`} name="emptyWeight" inputMode="decimal" defaultValue={defaults.emptyWeight} errors={e.emptyWeight} />
        <Field label={`Empty arm (${units.arm})`} name="emptyArm" inputMode="decimal" defaultValue={defaults.emptyArm} errors={e.emptyArm} />
        <Field label={`Maximum takeoff weight (${units.weight})`} name="maxTakeoffWeight" inputMode="decimal" defaultValue={defaults.maxTakeoffWeight} errors={e.maxTakeoffWeight} />
        <Field label={`Maximum landing weight (${units.weight}, if any)`} name="maxLandingWeight" inputMode="decimal" defaultValue={defaults.maxLandingWeight} errors={e.maxLandingWeight} />
        <SelectField label="Fuel" name="fuelKind" defaultValue={defaults.fuelKind} errors={e.fuelKind}>
          <option value="avgas">{`Avgas (${fuelDensityNote("avgas", unitSystem, locale)})`}</option>
          <option value="jet">{`Jet fuel (${fuelDensityNote("jet", unitSystem, locale)})`}</option>
        </SelectField>
        <Field label={`Cruise burn (${units.fuel} per hour)`} name="burnPerHour" inputMode="decimal" defaultValue={defaults.burnPerHour} errors={e.burnPerHour} />
      </div>
      <TextAreaField label="Stations: name | arm | limit, one per line" name="stations" rows={4} defaultValue={defaults.stations} errors={e.stations} hint={`Arms in ${units.arm}, limits in ${units.weight}; leave the limit off when there is none.`} />
      <TextAreaField label="Fuel tanks: name | arm | usable capacity, one per line" name="tanks" rows={3} defaultValue={defaults.tanks} errors={e.tanks} hint={`Capacity in ${units.fuel}.`} />
      <TextAreaField label="Normal-category envelope: arm, weight per corner" name="envelopeNormal" rows={6} defaultValue={defaults.envelopeNormal} errors={e.envelopeNormal} hint="Corners in order around the polygon, as the flight manual draws it." />
      <TextAreaField label="Utility-category envelope (if the aircraft has one)" name="envelopeUtility" rows={5} defaultValue={defaults.envelopeUtility} errors={e.envelopeUtility} />
      <Field label="Source of the figures" name="source" defaultValue={defaults.source} errors={e.source} hint="e.g. the weighing report and its date." />
      <SubmitButton>Save figures</SubmitButton>
    </FormShell>
  );
}
