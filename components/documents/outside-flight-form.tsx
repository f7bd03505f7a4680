"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { recordOutsideFlight } from "@/lib/actions/documents/record-outside-flight";
import { CheckboxField } from "@/components/ui/field";
import { AIRCRAFT_CATEGORIES, AIRCRAFT_CLASSES } from "@/lib/currency/aircraft-class";

export function OutsideFlightForm({ slug, today, typeGroups }: { slug: string; today: string; typeGroups: string[] }) {
  const form = useFormAction(recordOutsideFlight);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Add a flight from elsewhere">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <Field label="Date flown" name="flownOn" type="date" max={today} errors={e.flownOn} />
        <Field label="Aircraft" name="aircraftDescription" maxLength={120} errors={e.aircraftDescription} hint="Type, and where you flew it." />
        <SelectField label="Category" name="category" defaultValue="Airplane" errors={e.category}>
          {AIRCRAFT_CATEGORIES.map((c) => <option key={c} value={c}>{c}</option>)}
        </SelectField>
        <SelectField label="Class" name="classRating" defaultValue="Single-engine land" errors={e.classRating} hint="Landings count toward passenger currency in the same category and class only (14 CFR 61.57(a))."> 
          {AIRCRAFT_CLASSES.map((c) => <option key={c} value={c}>{c}</option>)}
        </SelectField>
        <CheckboxField label="Tailwheel airplane" name="tailwheel" errors={e.tailwheel} hint="In a tailwheel airplane only full-stop landings count (14 CFR 61.57(a)(1)(ii))." />
        <Field label="Day landings" name="dayLandings" type="number" min={0} max={99} inputMode="numeric" defaultValue="0" errors={e.dayLandings} />
        <Field label="Full stops among them" name="dayFullStopLandings" type="number" min={0} max={99} inputMode="numeric" defaultValue="" errors={e.dayFullStopLandings} hint="Leave empty if not known; a tailwheel airplane needs full stops." />
        <Field label="Night full-stop landings" name="nightFullStopLandings" type="number" min={0} max={99} inputMode="numeric" defaultValue="0" errors={e.nightFullStopLandings} />
        <SelectField label="Same type group as a club aircraft? (optional)" name="typeGroup" defaultValue="" errors={e.typeGroup}>
          <option value="">No / not sure</option>
          {typeGroups.map((g) => (
            <option key={g} value={g}>{g}</option>
          ))}
        </SelectField>
        <Field label="Note (optional)" name="note" maxLength={500} errors={e.note} />
      </div>
      <SubmitButton>Add flight</SubmitButton>
    </FormShell>
  );
}
