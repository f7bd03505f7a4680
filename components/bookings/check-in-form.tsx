"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { Field, TextAreaField } from "@/components/ui/field";
import { checkInBooking } from "@/lib/actions/bookings/check-in-booking";

export function CheckInForm({ slug, bookingId, hobbs, tach, metric, rateText, checkedIn }: { slug: string; bookingId: string; hobbs: number | null; tach: number | null; metric: boolean; rateText: string; checkedIn: boolean }) {
  const form = useFormAction(checkInBooking);
  const { state } = form;
  const e = state.fieldErrors;
  if (state.ok) {
    return <p role="status" className="rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">✓ {state.message}</p>;
  }
  // Kept mounted when the page re-renders after check-in, so the message above survives.
  if (checkedIn) return <p role="status">✓ This booking is checked in; the flight is in the log.</p>;
  return (
    <FormShell form={form} label="Check in">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <div className="grid grid-cols-2 gap-x-3">
        <Field label="Hobbs out" name="hobbsOut" inputMode="decimal" defaultValue={hobbs?.toFixed(1) ?? ""} errors={e.hobbsOut} />
        <Field label="Hobbs in" name="hobbsIn" inputMode="decimal" errors={e.hobbsIn} />
        <Field label="Tach out" name="tachOut" inputMode="decimal" defaultValue={tach?.toFixed(1) ?? ""} errors={e.tachOut} />
        <Field label="Tach in" name="tachIn" inputMode="decimal" errors={e.tachIn} />
        <Field label="Day landings" name="dayLandings" inputMode="numeric" defaultValue="1" errors={e.dayLandings} />
        <Field label="Full stops among them (optional)" name="dayFullStopLandings" inputMode="numeric" defaultValue="" errors={e.dayFullStopLandings} hint="Counts for tailwheel currency (14 CFR 61.57(a)(1)(ii))." />
        <Field label="Night full-stop landings" name="nightFullStopLandings" inputMode="numeric" defaultValue="0" errors={e.nightFullStopLandings} />
        <Field label={`Fuel added (${metric ? "litres" : "US gal"})`} name="fuelAdded" inputMode="decimal" defaultValue="0" errors={e.fuelAdded} />
        <Field label={`Oil added (${metric ? "litres" : "quarts"})`} name="oilAdded" inputMode="decimal" defaultValue="0" errors={e.oilAdded} />
      </div>
      <TextAreaField label="Squawk (optional)" name="squawk" errors={e.squawk} hint="Anything wrong with the aircraft: it goes to maintenance with this flight." />
      <TextAreaField label="Notes (optional)" name="notes" errors={e.notes} rows={2} />
      <TextAreaField label="Meter explanation (only when the meters do not continue)" name="meterExplanation" errors={e.meterExplanation} rows={2} hint="Needed when your Hobbs or tach out differs from the aircraft's last in reading; it is recorded on this flight for maintenance and the treasurer." />
      <p className="mb-3 text-sm text-ink-700">The flight is charged at {rateText} and posted to your account once. Out readings that do not continue from the aircraft&apos;s last in reading need an explanation.</p>
      <SubmitButton pendingText="Checking in…">Check in</SubmitButton>
    </FormShell>
  );
}
