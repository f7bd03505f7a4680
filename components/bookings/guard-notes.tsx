import type { ActionState } from "@/lib/actions/action-state";

const GUARD_LABELS: Record<string, string> = {
  grounded: "Aircraft grounded",
  inspectionDue: "Inspection comes due",
  notCheckedOut: "No checkout in the type",
  notCurrent: "Not current",
  flightReview: "Flight review",
  limitations: "Flies with limits",
  medicalExpired: "Medical",
  inArrears: "Account overdue",
  statusUnknown: "Status unknown",
};

/**
 * What stands against the booking: refusals (it cannot be booked) and warnings, each with a box
 * the member ticks to say they have read it. The boxes carry the guard keys back to the server.
 */
export function GuardNotes({ state }: { state: ActionState }) {
  const refusals = state.fieldErrors.refusals ?? [];
  const warnings = state.fieldErrors.warnings ?? [];
  const guards = state.fieldErrors.warningGuards ?? [];
  if (!refusals.length && !warnings.length) return null;
  return (
    <div className="mb-4 space-y-3">
      {refusals.length ? (
        <section role="alert" aria-label="Why it cannot be booked" className="rounded border-l-4 border-stop-600 bg-stop-100 px-3 py-2">
          <h3 className="font-bold text-stop-800">■ Cannot be booked</h3>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">{refusals.map((r) => <li key={r}>{r}</li>)}</ul>
        </section>
      ) : null}
      {warnings.length ? (
        <fieldset className="rounded border-l-4 border-sock-500 bg-sock-100 px-3 py-2" aria-label="Warnings to read">
          <legend className="sr-only">Warnings to read</legend>
          <h3 className="font-bold text-sock-700">▲ Read before booking</h3>
          <ul className="mt-1 space-y-2 text-sm">
            {warnings.map((w, i) => (
              <li key={w}>
                <label className="flex items-start gap-2">
                  <input type="checkbox" name="acceptedGuards[]" value={guards[i] ?? ""} className="mt-0.5 h-5 w-5 shrink-0" disabled={refusals.length > 0} />
                  <span><strong>{GUARD_LABELS[guards[i] ?? ""] ?? "Warning"}:</strong> {w} <em>I have read this.</em></span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      ) : null}
    </div>
  );
}
