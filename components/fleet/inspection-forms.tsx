"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { CheckboxField, Field, FileField, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { createInspectionItem } from "@/lib/actions/fleet/create-inspection-item";
import { recordCompletion } from "@/lib/actions/fleet/record-completion";
import { recordMeterConversion } from "@/lib/actions/fleet/record-meter-conversion";
import { updateInspectionItem } from "@/lib/actions/fleet/update-inspection-item";

export function RecordCompletionForm({ slug, itemId, itemName, today, hoursBased, fixedDate, meterName, meterNow }: { slug: string; itemId: string; itemName: string; today: string; hoursBased: boolean; fixedDate: boolean; meterName: string; meterNow: number | null }) {
  const form = useFormAction(recordCompletion);
  const { state } = form;
  const e = state.fieldErrors;
  const p = `c-${itemId}`;
  return (
    <FormShell form={form} label={`Record ${itemName}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="itemId" value={itemId} />
      <Field label="Date done" name="doneOn" id={`${p}-on`} type="date" defaultValue={today} max={today} errors={e.doneOn} />
      <Field label={`${meterName === "hobbs" ? "Hobbs" : "Tach"} when done${hoursBased ? "" : " (optional)"}`} name="hours" id={`${p}-hours`} inputMode="decimal" defaultValue={meterNow?.toFixed(1) ?? ""} errors={e.hours} />
      {fixedDate ? <Field label="Expires on" name="expiresOn" id={`${p}-exp`} type="date" errors={e.expiresOn} hint="For the ELT battery: the date half its useful life is gone (14 CFR 91.207(c))." /> : null}
      <Field label="Mechanic's name" name="mechanicName" id={`${p}-mech`} errors={e.mechanicName} />
      <Field label="Certificate number" name="mechanicCertificate" id={`${p}-cert`} errors={e.mechanicCertificate} />
      <TextAreaField label="Notes (optional)" name="notes" id={`${p}-notes`} rows={2} errors={e.notes} />
      <FileField label="Work order or logbook page (optional)" name="document" id={`${p}-doc`} accept="image/jpeg,image/png,image/webp,image/heic,application/pdf" hint="PDF or photo, up to 10 MB." errors={e.document} />
      <SubmitButton>Record completion</SubmitButton>
    </FormShell>
  );
}

export function CreateItemForm({ slug, aircraftId }: { slug: string; aircraftId: string }) {
  const form = useFormAction(createInspectionItem);
  const { state } = form;
  const [kind, setKind] = useState("calendar-months");
  const e = state.fieldErrors;
  const months = kind === "calendar-months" || kind === "months-or-hours";
  const hours = kind === "hours" || kind === "months-or-hours";
  return (
    <FormShell form={form} label="Add an inspection item">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <Field label="Name" name="name" id="item-name" errors={e.name} placeholder="e.g. AD 0000-00-00 recurring fuel-line check" />
      <SelectField label="Origin" name="origin" id="item-origin" defaultValue="directive" errors={e.origin}>
        <option value="directive">Recurring airworthiness directive</option>
        <option value="club">Club item</option>
      </SelectField>
      <SelectField label="Comes due" name="ruleKind" id="item-rule" value={kind} onChange={(ev) => setKind(ev.target.value)} errors={e.ruleKind}>
        <option value="calendar-months">Every N calendar months</option>
        <option value="hours">Every N hours</option>
        <option value="months-or-hours">Months or hours, whichever first</option>
        <option value="days">Every N days</option>
        <option value="fixed-date">On a date set at each completion</option>
      </SelectField>
      <div className="grid grid-cols-2 gap-x-3">
        {months ? <Field label="Calendar months" name="months" id="item-months" inputMode="numeric" errors={e.months} /> : null}
        {hours ? <Field label="Hours" name="hours" id="item-hours" inputMode="decimal" errors={e.hours} /> : null}
        {hours ? <Field label="Overrun allowed (h)" name="overrunHours" id="item-overrun" inputMode="decimal" errors={e.overrunHours} /> : null}
        {kind === "days" ? <Field label="Days" name="days" id="item-days" inputMode="numeric" errors={e.days} /> : null}
      </div>
      <Field label="Source (optional)" name="source" id="item-source" errors={e.source} placeholder="e.g. AD 0000-00-00" />
      <CheckboxField name="required" id="item-required" label="Required: grounds the aircraft when overdue" defaultChecked errors={e.required} />
      <CheckboxField name="ifrOnly" id="item-ifr" label="Needed only for IFR flight" errors={e.ifrOnly} />
      <SubmitButton>Add item</SubmitButton>
    </FormShell>
  );
}

export function UpdateItemForm({ slug, itemId, hasUsage, canRetire }: { slug: string; itemId: string; hasUsage: boolean; canRetire: boolean }) {
  const form = useFormAction(updateInspectionItem);
  const { state } = form;
  const p = `u-${itemId}`;
  return (
    <FormShell form={form} label="Update inspection item">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="itemId" value={itemId} />
      {hasUsage ? <Field label="Cumulative use since the last completion (h)" name="usageUsedHours" id={`${p}-use`} inputMode="decimal" errors={state.fieldErrors.usageUsedHours} /> : null}
      {canRetire ? <CheckboxField name="retire" id={`${p}-retire`} label="Retire this item (it no longer applies); its history stays" errors={state.fieldErrors.retire} /> : null}
      <Field label="Note (optional)" name="note" id={`${p}-note`} errors={state.fieldErrors.note} />
      <SubmitButton variant="secondary">Save item</SubmitButton>
    </FormShell>
  );
}

/** After a meter switch: maintenance records where the item's last completion stands on the new meter. */
export function MeterConversionForm({ slug, itemId, itemName, fromMeter, toMeter, lastHours }: { slug: string; itemId: string; itemName: string; fromMeter: "hobbs" | "tach"; toMeter: "hobbs" | "tach"; lastHours: number | null }) {
  const form = useFormAction(recordMeterConversion);
  const { state } = form;
  const e = state.fieldErrors;
  const word = (m: "hobbs" | "tach") => (m === "hobbs" ? "Hobbs" : "tach");
  const p = `mc-${itemId}`;
  return (
    <FormShell form={form} label={`Record ${itemName} on the ${word(toMeter)}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="itemId" value={itemId} />
      <Field label={`Last completion on the ${word(toMeter)}`} name="reading" id={`${p}-reading`} inputMode="decimal" errors={e.reading}
        hint={`It was recorded${lastHours !== null ? ` at ${lastHours.toFixed(1)} h` : ""} on the ${word(fromMeter)}. From the logbooks, enter the ${word(toMeter)} reading it corresponds to.`} />
      <TextAreaField label="Note (optional)" name="note" id={`${p}-note`} rows={2} errors={e.note} />
      <SubmitButton>Record the {word(toMeter)} reading</SubmitButton>
    </FormShell>
  );
}
