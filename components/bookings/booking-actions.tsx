"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { CheckboxField, Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { cancelBooking } from "@/lib/actions/bookings/cancel-booking";
import { changeBooking } from "@/lib/actions/bookings/change-booking";
import { beginFlight } from "@/lib/actions/bookings/begin-flight";
import { GuardNotes } from "./guard-notes";

type Choice = { id: string; label: string };

export function ChangeBookingForm({ slug, bookingId, defaults, instructors, lateNote }: { slug: string; bookingId: string; defaults: { startsAt: string; endsAt: string; instructorId: string }; instructors: Choice[]; lateNote: string | null }) {
  const form = useFormAction(changeBooking);
  const { state } = form;
  const [values, setValues] = useState(defaults);
  const set = (k: keyof typeof values) => (e: { target: { value: string } }) => setValues((v) => ({ ...v, [k]: e.target.value }));
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Change the booking">
      <GuardNotes state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="New start (club time)" name="startsAt" type="datetime-local" step={900} value={values.startsAt} onChange={set("startsAt")} errors={e.startsAt} />
        <Field label="New end (club time)" name="endsAt" type="datetime-local" step={900} value={values.endsAt} onChange={set("endsAt")} errors={e.endsAt} />
      </div>
      <SelectField label="Instructor" name="instructorId" value={values.instructorId} onChange={set("instructorId")} errors={e.instructorId}>
        <option value="">No instructor</option>
        {instructors.map((i) => <option key={i.id} value={i.id}>{i.label}</option>)}
      </SelectField>
      {lateNote ? <p className="mb-3 text-sm text-sock-700">▲ {lateNote}</p> : null}
      <SubmitButton variant="secondary">Save the change</SubmitButton>
    </FormShell>
  );
}

export function CancelBookingForm({ slug, bookingId, lateNote }: { slug: string; bookingId: string; lateNote: string | null }) {
  const form = useFormAction(cancelBooking);
  const { state } = form;
  return (
    <FormShell form={form} label="Cancel the booking">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <Field label="Reason (optional)" name="reason" maxLength={300} errors={state.fieldErrors.reason} />
      {lateNote ? <p className="mb-3 text-sm text-sock-700">▲ {lateNote}</p> : null}
      <SubmitButton variant="danger" pendingText="Cancelling…">Cancel the booking</SubmitButton>
    </FormShell>
  );
}

export function BeginFlightForm({ slug, bookingId, records, limitations = [] }: { slug: string; bookingId: string; records: { id: string; label: string }[]; limitations?: string[] }) {
  const form = useFormAction(beginFlight);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Begin flight">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <SelectField label="Preflight record" name="preflightRecordId" defaultValue={records[0]?.id ?? ""} errors={e.preflightRecordId}>
        {records.map((r) => <option key={r.id} value={r.id}>{r.label}</option>)}
      </SelectField>
      <CheckboxField label="I did this preflight myself, and as pilot in command I find the aircraft fit for this flight." name="confirmPreflight" errors={e.confirmPreflight} />
      {limitations.length || e.acceptLimitations ? (
        <fieldset className="mb-3 rounded border-l-4 border-sock-500 bg-sock-100 px-3 py-2 text-sm" aria-label="Limitations of this aircraft">
          <legend className="sr-only">Limitations of this aircraft</legend>
          <h4 className="font-bold text-sock-700">▲ This aircraft flies with limits</h4>
          <ul className="mb-2 list-disc pl-5">{(e.acceptLimitations ?? limitations).map((l) => <li key={l}>{l}</li>)}</ul>
          <CheckboxField label="I have read each limitation and will fly this flight within them." name="acceptLimitations" />
        </fieldset>
      ) : null}
      {e.acceptFindings ? (
        <div className="mb-3 rounded border-l-4 border-sock-500 bg-sock-100 px-3 py-2 text-sm" role="alert">
          <ul className="list-disc pl-5">{e.acceptFindings.map((c) => <li key={c}>{c}</li>)}</ul>
        </div>
      ) : null}
      <CheckboxField label="I have dealt with every finding listed for this aircraft." name="acceptFindings" hint="Needed only when the record or the aircraft's status shows something." />
      <SubmitButton pendingText="Beginning…">Begin flight</SubmitButton>
    </FormShell>
  );
}
