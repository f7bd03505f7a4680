"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { createAircraft } from "@/lib/actions/fleet/create-aircraft";
import { updateAircraft } from "@/lib/actions/fleet/update-aircraft";
import { CheckboxField, Field, FileField, SelectField, TextAreaField } from "@/components/ui/field";
import { AIRCRAFT_CATEGORIES, AIRCRAFT_CLASSES } from "@/lib/currency/aircraft-class";

export type AircraftFormValues = {
  id: string;
  registration: string;
  make: string;
  model: string;
  typeGroup: string;
  category: string;
  classRating: string;
  tailwheel: boolean;
  serialNumber: string | null;
  year: number | null;
  homeField: string | null;
  hourlyRate: string;
  rateMeter: "hobbs" | "tach";
  maintenanceMeter: "hobbs" | "tach";
  currentHobbs: number | null;
  currentTach: number | null;
  usedForHire: boolean;
  usedForInstruction: boolean;
  ifrEquipped: boolean;
  usedForIfr: boolean;
  engineTboHours: number | null;
  engineTimeSinceOverhaul: number | null;
  notes: string | null;
};

export function AircraftForm({ slug, currency, values }: { slug: string; currency: string; locale?: string; values?: AircraftFormValues }) {
  const form = useFormAction(values ? updateAircraft : createAircraft, { keepValuesAfterOk: Boolean(values) });
  const { state } = form;
  const e = state.fieldErrors;
  const v = values;
  return (
    <FormShell form={form} label={v ? `Edit ${v.registration}` : "Add an aircraft"}>
      <input type="hidden" name="club" value={slug} />
      {v ? <input type="hidden" name="aircraftId" value={v.id} /> : null}
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="Registration" name="registration" defaultValue={v?.registration} errors={e.registration} autoCapitalize="characters" />
        <Field label="Type group (for checkouts)" name="typeGroup" defaultValue={v?.typeGroup} errors={e.typeGroup} />
        <Field label="Make" name="make" defaultValue={v?.make} errors={e.make} />
        <Field label="Model" name="model" defaultValue={v?.model} errors={e.model} />
        <SelectField label="Category" name="category" defaultValue={v?.category ?? "Airplane"} errors={e.category}>
          {AIRCRAFT_CATEGORIES.map((c) => <option key={c} value={c}>{c}</option>)}
        </SelectField>
        <SelectField label="Class" name="classRating" defaultValue={v?.classRating ?? "Single-engine land"} errors={e.classRating} hint="Passenger currency counts landings in the same category and class (14 CFR 61.57(a)).">
          {AIRCRAFT_CLASSES.map((c) => <option key={c} value={c}>{c}</option>)}
        </SelectField>
        <CheckboxField label="Tailwheel airplane" name="tailwheel" defaultChecked={v?.tailwheel ?? false} errors={e.tailwheel} hint="Passengers need three full-stop landings in a tailwheel airplane (14 CFR 61.57(a)(1)(ii))." />
        <Field label="Serial number" name="serialNumber" defaultValue={v?.serialNumber ?? ""} errors={e.serialNumber} />
        <Field label="Year" name="year" inputMode="numeric" defaultValue={v?.year?.toString() ?? ""} errors={e.year} />
        <Field label="Home field" name="homeField" defaultValue={v?.homeField ?? ""} errors={e.homeField} />
        <Field label={`Hourly rate (${currency})`} name="hourlyRate" inputMode="decimal" defaultValue={v?.hourlyRate ?? ""} errors={e.hourlyRate} />
        <SelectField label="Rate charged by" name="rateMeter" defaultValue={v?.rateMeter ?? "hobbs"} errors={e.rateMeter}>
          <option value="hobbs">Hobbs</option>
          <option value="tach">Tach</option>
        </SelectField>
        <SelectField label="Inspections count by" name="maintenanceMeter" defaultValue={v?.maintenanceMeter ?? "tach"} errors={e.maintenanceMeter}>
          <option value="tach">Tach</option>
          <option value="hobbs">Hobbs</option>
        </SelectField>
        <Field label="Current Hobbs" name="currentHobbs" inputMode="decimal" defaultValue={v?.currentHobbs?.toFixed(1) ?? ""} errors={e.currentHobbs} />
        <Field label="Current tach" name="currentTach" inputMode="decimal" defaultValue={v?.currentTach?.toFixed(1) ?? ""} errors={e.currentTach} />
        {v ? (
          <Field label="Conversion reading (only when switching the meter inspections count by)" name="conversionReading" inputMode="decimal" defaultValue="" errors={e.conversionReading}
            hint={`Inspections count by the ${v.maintenanceMeter === "hobbs" ? "Hobbs" : "tach"} now. To switch, enter the new meter's reading at the switch, the same as its current reading above.`} />
        ) : null}
        {v ? (
          <Field label="Reason for lowering a reading (maintenance only)" name="readingChangeReason" defaultValue="" errors={e.readingChangeReason}
            hint="Needed only when a current reading goes down, e.g. a meter replaced; kept in the audit log." />
        ) : null}
        <Field label="Engine TBO (h, optional)" name="engineTboHours" inputMode="decimal" defaultValue={v?.engineTboHours?.toString() ?? ""} errors={e.engineTboHours} />
        <Field label="Engine time since overhaul (h, optional)" name="engineTimeSinceOverhaul" inputMode="decimal" defaultValue={v?.engineTimeSinceOverhaul?.toString() ?? ""} errors={e.engineTimeSinceOverhaul} />
      </div>
      <fieldset className="mb-4">
        <legend className="field-label">Which rules apply</legend>
        <CheckboxField name="usedForInstruction" label="Used for flight instruction for hire (100-hour, 14 CFR 91.409(b))" defaultChecked={v?.usedForInstruction} errors={e.usedForInstruction} />
        <CheckboxField name="usedForHire" label="Carries persons for hire (100-hour)" defaultChecked={v?.usedForHire} errors={e.usedForHire} />
        <CheckboxField name="ifrEquipped" label="Equipped for IFR (altimeter/static 91.411, VOR check 91.171)" defaultChecked={v?.ifrEquipped} errors={e.ifrEquipped} />
        <CheckboxField name="usedForIfr" label="Used for IFR flight" defaultChecked={v?.usedForIfr} errors={e.usedForIfr} />
      </fieldset>
      <TextAreaField label="Notes (optional)" name="notes" defaultValue={v?.notes ?? ""} errors={e.notes} rows={2} />
      {v ? <FileField label="Photo (optional)" name="photo" accept="image/jpeg,image/png,image/webp,image/heic" hint="JPEG, PNG, WebP or HEIC, up to 10 MB." errors={e.photo} /> : null}
      {v ? <p className="mb-3 text-sm text-ink-500">Changing the meters here is a correction and is kept in the audit log; flights move them normally.</p> : null}
      <SubmitButton>{v ? "Save aircraft" : "Add aircraft"}</SubmitButton>
    </FormShell>
  );
}
