"use client";
import { useState } from "react";
import { Field, SelectField, TextAreaField } from "@/components/ui/field";
import { FormShell } from "@/components/ui/form-shell";
import { SubmitButton } from "@/components/ui/submit-button";
import { useFormAction } from "@/components/ui/use-form-action";
import { blockAircraft, removeBlock } from "@/lib/actions/bookings/block-aircraft";
import { addAvailability, removeAvailability } from "@/lib/actions/bookings/instructor-availability";

// The schedule's own forms: maintenance blocks an aircraft's time, an instructor keeps the times
// they are available. Each is the one form pattern (useFormAction + FormShell).

type Choice = { id: string; label: string };

export function BlockForm({ slug, aircraft, defaults }: { slug: string; aircraft: Choice[]; defaults: { startsAt: string; endsAt: string } }) {
  const form = useFormAction(blockAircraft);
  const e = form.state.fieldErrors;
  const [values, setValues] = useState({ aircraftId: "", startsAt: defaults.startsAt, endsAt: defaults.endsAt, reason: "" });
  const set = (k: keyof typeof values) => (ev: { target: { value: string } }) => setValues((v) => ({ ...v, [k]: ev.target.value }));
  return (
    <FormShell form={form} label="Block an aircraft for maintenance">
      <input type="hidden" name="club" value={slug} />
      <SelectField label="Aircraft" name="aircraftId" value={values.aircraftId} onChange={set("aircraftId")} errors={e.aircraftId}>
        <option value="" disabled>Choose an aircraft</option>
        {aircraft.map((a) => <option key={a.id} value={a.id}>{a.label}</option>)}
      </SelectField>
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="From (club time)" name="startsAt" type="datetime-local" step={900} value={values.startsAt} onChange={set("startsAt")} errors={e.startsAt} />
        <Field label="Until (club time)" name="endsAt" type="datetime-local" step={900} value={values.endsAt} onChange={set("endsAt")} errors={e.endsAt} />
      </div>
      <TextAreaField label="Reason, shown to members" name="reason" value={values.reason} onChange={set("reason")} errors={e.reason} maxLength={200} rows={2} />
      <SubmitButton pendingText="Blocking…">Block this time</SubmitButton>
    </FormShell>
  );
}

export function RemoveBlockButton({ slug, blockId, label }: { slug: string; blockId: string; label: string }) {
  const form = useFormAction(removeBlock);
  return (
    <FormShell form={form} label={`Remove block: ${label}`} answer="inline-after" confirm="Remove this block? The time can be booked again.">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="blockId" value={blockId} />
      <SubmitButton variant="secondary" pendingText="Removing…">Remove</SubmitButton>
    </FormShell>
  );
}

export function AvailabilityForm({ slug, defaults }: { slug: string; defaults: { startsAt: string; endsAt: string } }) {
  const form = useFormAction(addAvailability);
  const e = form.state.fieldErrors;
  const [values, setValues] = useState({ startsAt: defaults.startsAt, endsAt: defaults.endsAt, repeatWeeks: "1" });
  const set = (k: keyof typeof values) => (ev: { target: { value: string } }) => setValues((v) => ({ ...v, [k]: ev.target.value }));
  return (
    <FormShell form={form} label="Add an available time">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="From (club time)" name="startsAt" type="datetime-local" step={900} value={values.startsAt} onChange={set("startsAt")} errors={e.startsAt} />
        <Field label="Until (club time)" name="endsAt" type="datetime-local" step={900} value={values.endsAt} onChange={set("endsAt")} errors={e.endsAt} />
      </div>
      <SelectField label="Repeat" name="repeatWeeks" value={values.repeatWeeks} onChange={set("repeatWeeks")} errors={e.repeatWeeks}>
        <option value="1">Only this once</option>
        {[2, 4, 8, 12].map((n) => <option key={n} value={String(n)}>{`Same time weekly, ${n} weeks`}</option>)}
      </SelectField>
      <SubmitButton pendingText="Saving…">Add available time</SubmitButton>
    </FormShell>
  );
}

export function RemoveAvailabilityButton({ slug, availabilityId, label }: { slug: string; availabilityId: string; label: string }) {
  const form = useFormAction(removeAvailability);
  return (
    <FormShell form={form} label={`Remove available time: ${label}`} answer="inline-after">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="availabilityId" value={availabilityId} />
      <SubmitButton variant="secondary" pendingText="Removing…">Remove</SubmitButton>
    </FormShell>
  );
}
