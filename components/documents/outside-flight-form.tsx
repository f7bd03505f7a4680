"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { recordOutsideFlight } from "@/lib/actions/documents/record-outside-flight";

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
        <Field label="Day landings" name="dayLandings" type="number" min={0} max={99} inputMode="numeric" defaultValue="0" errors={e.dayLandings} />
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
