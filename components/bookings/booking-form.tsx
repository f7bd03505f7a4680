"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import Link from "next/link";
import { useState } from "react";
import { CheckboxField, Field, SelectField } from "@/components/ui/field";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import type { CreateBookingData } from "@/lib/actions/bookings/create-booking";
import { GuardNotes } from "./guard-notes";

/** A weekly booking's answer, week by week: booked (with a link) or not, and why. */
function WeeksAnswer({ slug, data }: { slug: string; data: CreateBookingData | undefined }) {
  if (!data?.booked) return null;
  return (
    <ul className="mt-3 space-y-1 text-sm" aria-label="Weeks">
      {data.booked.map((b) => <li key={b.bookingId}>✓ Booked: <Link className="underline" href={`/clubs/${slug}/bookings/${b.bookingId}`}>{b.when}</Link></li>)}
      {(data.refused ?? []).map((r) => <li key={r.startsAt}>✕ Not booked: {r.when} — {r.reason}</li>)}
    </ul>
  );
}

type Choice = { id: string; label: string };

export function BookingForm({ slug, aircraft, instructors, members, defaults }: { slug: string; aircraft: Choice[]; instructors: Choice[]; members: Choice[] | null; defaults: { aircraftId: string; startsAt: string; endsAt: string; instructorId?: string } }) {
  const form = useFormAction(createBooking);
  const { state } = form;
  const [values, setValues] = useState({ ...defaults, instructorId: defaults.instructorId ?? "", memberId: "", purpose: "", carryingPassengers: false, repeatWeeks: "1" });
  const set = (k: keyof typeof values) => (e: { target: { value: string; checked?: boolean; type?: string } }) => setValues((v) => ({ ...v, [k]: e.target.type === "checkbox" ? Boolean(e.target.checked) : e.target.value }));
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Book an aircraft">
      <GuardNotes state={state} />
      <input type="hidden" name="club" value={slug} />
      <SelectField label="Aircraft" name="aircraftId" value={values.aircraftId} onChange={set("aircraftId")} errors={e.aircraftId}>
        <option value="" disabled>Choose an aircraft</option>
        {aircraft.map((a) => <option key={a.id} value={a.id}>{a.label}</option>)}
      </SelectField>
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="Start (club time)" name="startsAt" type="datetime-local" step={900} value={values.startsAt} onChange={set("startsAt")} errors={e.startsAt} />
        <Field label="End (club time)" name="endsAt" type="datetime-local" step={900} value={values.endsAt} onChange={set("endsAt")} errors={e.endsAt} />
      </div>
      {members ? (
        <SelectField label="Member flying" name="memberId" value={values.memberId} onChange={set("memberId")} errors={e.memberId} hint="Leave as yourself, or book for a student.">
          <option value="">Myself</option>
          {members.map((m) => <option key={m.id} value={m.id}>{m.label}</option>)}
        </SelectField>
      ) : null}
      <SelectField label="Instructor" name="instructorId" value={values.instructorId} onChange={set("instructorId")} errors={e.instructorId} hint="With an instructor aboard, the instructor is pilot in command.">
        <option value="">No instructor (solo or with passengers)</option>
        {instructors.map((i) => <option key={i.id} value={i.id}>{i.label}</option>)}
      </SelectField>
      <SelectField label="Repeat" name="repeatWeeks" value={values.repeatWeeks} onChange={set("repeatWeeks")} errors={e.repeatWeeks} hint="Each week is checked on its own; the answer lists the weeks booked and any refused, with the reason.">
        <option value="1">Only this once</option>
        {[2, 3, 4, 6, 8, 10, 12].map((n) => <option key={n} value={String(n)}>{`Same time weekly, ${n} weeks`}</option>)}
      </SelectField>
      <Field label="Purpose (optional)" name="purpose" value={values.purpose} onChange={set("purpose")} errors={e.purpose} maxLength={200} />
      <CheckboxField label="I plan to carry passengers" name="carryingPassengers" checked={values.carryingPassengers} onChange={set("carryingPassengers")} errors={e.carryingPassengers} hint="Then passenger currency (14 CFR 61.57(a)) is checked too." />
      <SubmitButton pendingText="Booking…">Book</SubmitButton>
      <WeeksAnswer slug={slug} data={state.ok ? (state.data as CreateBookingData | undefined) : undefined} />
    </FormShell>
  );
}
