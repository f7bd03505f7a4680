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
 * The warnings that stand against the booking, each with a box the member ticks to say they have
 * read it (the boxes carry the guard keys back to the server). A refusal is not repeated here: the
 * form's own answer already says it ("Not booked: …") — one message, not two. While there is a
 * refusal the boxes are disabled, since ticking cannot get past it.
 */
export function GuardNotes({ state }: { state: ActionState }) {
  const refusals = state.fieldErrors.refusals ?? [];
  const warnings = state.fieldErrors.warnings ?? [];
  const guards = state.fieldErrors.warningGuards ?? [];
  if (!warnings.length) return null;
  return (
    <div className="mb-4 space-y-3">
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
