"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { CheckboxField, Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { cancelBooking } from "@/lib/actions/bookings/cancel-booking";
import { changeBooking } from "@/lib/actions/bookings/change-booking";
import { beginFlight } from "@/lib/actions/bookings/begin-flight";
import { cancelBookingSeries } from "@/lib/actions/bookings/cancel-booking-series";
import { moveBookingSeries } from "@/lib/actions/bookings/move-booking-series";
import { GuardNotes } from "./guard-notes";

type Choice = { id: string; label: string };

export function ChangeBookingForm({ slug, bookingId, defaults, instructors, lateNote }: { slug: string; bookingId: string; defaults: { startsAt: string; endsAt: string; instructorId: string }; instructors: Choice[]; lateNote: string | null }) {
  const form = useFormAction(changeBooking);
  const { state } = form;
  const [values, setValues] = useState(defaults);
  // The booking moved under the form (a series move, another device): show its times now.
  const [shown, setShown] = useState(defaults);
  if (shown.startsAt !== defaults.startsAt || shown.endsAt !== defaults.endsAt || shown.instructorId !== defaults.instructorId) {
    setShown(defaults);
    setValues(defaults);
  }
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

export type SeriesWeekChoice = { id: string; label: string; current: boolean };

/**
 * "Move this and the later weeks" and "Cancel this and the later weeks" on a booking of a weekly
 * series. `weeks` are the weeks from this one on still booked and yet to start. The forms stay
 * mounted after the page refreshes, so that their answer (how many weeks, which were left as they
 * were) stays on screen even when nothing is left to act on.
 */
export function SeriesActions({ slug, bookingId, weeks, defaults, lateNote }: { slug: string; bookingId: string; weeks: SeriesWeekChoice[]; defaults: { startTime: string; endTime: string }; lateNote: string | null }) {
  const move = useFormAction(moveBookingSeries);
  const cancel = useFormAction(cancelBookingSeries);
  const [values, setValues] = useState(defaults);
  const set = (k: keyof typeof values) => (e: { target: { value: string } }) => setValues((v) => ({ ...v, [k]: e.target.value }));
  const open = weeks.length > 0;
  const showMove = open || move.answerCount > 0;
  const showCancel = open || cancel.answerCount > 0;
  if (!showMove && !showCancel) return null;
  const me = move.state.fieldErrors;
  return (
    <section className="mt-4" aria-labelledby="series-h">
      <h2 id="series-h" className="mb-1 text-lg font-bold">Weekly series</h2>
      {open ? (
        <>
          <p className="mb-2 text-sm">Booked as part of a weekly series. From this booking on, {weeks.length === 1 ? "1 week is" : `${weeks.length} weeks are`} still booked and yet to start:</p>
          <ul className="mb-3 flex flex-wrap gap-2 text-sm" aria-label="Weeks still booked">
            {weeks.map((w) => (
              <li key={w.id} className={`rounded border px-2 py-0.5 ${w.current ? "border-fin-600 font-bold" : "border-ink-300"}`}>
                {w.label}{w.current ? <span className="sr-only"> (this booking)</span> : null}
              </li>
            ))}
          </ul>
        </>
      ) : (
        <p className="mb-3 text-sm">No week of this series from this booking on is still booked and yet to start.</p>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {showMove ? (
          <section className="card" aria-labelledby="series-move-h">
            <h3 id="series-move-h" className="mb-3 font-bold">Move this and the later weeks</h3>
            <FormShell form={move} label="Move this and the later weeks">
              {open ? (
                <>
                  <GuardNotes state={move.state} />
                  <input type="hidden" name="club" value={slug} />
                  <input type="hidden" name="bookingId" value={bookingId} />
                  <div className="grid gap-x-3 sm:grid-cols-2">
                    <Field label="New start (club time)" name="startTime" type="time" step={900} value={values.startTime} onChange={set("startTime")} errors={me.startTime} />
                    <Field label="New end (club time)" name="endTime" type="time" step={900} value={values.endTime} onChange={set("endTime")} errors={me.endTime} />
                  </div>
                  <p className="mb-3 text-sm">Each week keeps its own date. A week that cannot take the new time stays as it is, and the answer says why.</p>
                  {lateNote ? <p className="mb-3 text-sm text-sock-700">▲ {lateNote}</p> : null}
                  <SubmitButton variant="secondary" pendingText="Moving…">Move this and the later weeks</SubmitButton>
                </>
              ) : null}
            </FormShell>
          </section>
        ) : null}
        {showCancel ? (
          <section className="card" aria-labelledby="series-cancel-h">
            <h3 id="series-cancel-h" className="mb-3 font-bold">Cancel this and the later weeks</h3>
            <FormShell form={cancel} label="Cancel this and the later weeks">
              {open ? (
                <>
                  <input type="hidden" name="club" value={slug} />
                  <input type="hidden" name="bookingId" value={bookingId} />
                  <Field id="series-cancel-reason" label="Reason (optional)" name="reason" maxLength={300} errors={cancel.state.fieldErrors.reason} />
                  <p className="mb-3 text-sm">Weeks already flown, begun or past are left as they are.</p>
                  {lateNote ? <p className="mb-3 text-sm text-sock-700">▲ {lateNote}</p> : null}
                  <SubmitButton variant="danger" pendingText="Cancelling…">Cancel this and the later weeks</SubmitButton>
                </>
              ) : null}
            </FormShell>
          </section>
        ) : null}
      </div>
    </section>
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
