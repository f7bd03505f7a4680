"use client";
import type { z } from "zod";
import type { ActionState } from "@/lib/actions/action-state";
import { fieldsToObject, isNetworkFailure, newQueuedWrite, toStoredFields, type QueuedKind } from "@/lib/ramp/queue";
import { newIdempotencyKey } from "@/components/ui/idempotency-key-field";
import { currentUserId, keep } from "./queue-store";

type Action<S extends ActionState> = (prev: ActionState, formData: FormData) => Promise<S>;

/** The form's answer when its write was kept on the device (ok: the form clears and takes a new key). */
export const KEPT_MESSAGE = "No signal: kept on this phone. It goes to the club by itself when there is signal.";

function issuesToFieldErrors(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) (out[issue.path.length ? issue.path.join(".") : "_form"] ??= []).push(issue.message);
  return out;
}

/**
 * Wraps a form's server action for the ramp: with signal it is the action itself; with none
 * (navigator.onLine false, or the send failing before it reached the server) the submission —
 * its files as Blobs and its idempotency key — is kept on the device and sent later through the
 * same action by components/ramp/queue-store.ts. The form's own schema is checked first, so a
 * mistake is shown now rather than refused an hour later.
 *
 *   const [state, action] = useActionState(rampAction("squawk", reportSquawk, reportSquawkSchema), initialActionState);
 */
export function rampAction<S extends ActionState>(kind: QueuedKind, action: Action<S>, schema?: z.ZodType): Action<S> {
  const keepIt = async (formData: FormData): Promise<S | null> => {
    const userId = currentUserId();
    if (!userId) return null; // not in a club page with ramp mode: nothing to keep it for
    const fields = toStoredFields(formData.entries());
    if (schema) {
      const parsed = schema.safeParse(fieldsToObject(fields));
      if (!parsed.success) return { ok: false, message: "Some fields need attention; nothing was kept.", fieldErrors: issuesToFieldErrors(parsed.error) } as S;
    }
    await keep(newQueuedWrite({ kind, userId, fields, now: Date.now(), makeKey: newIdempotencyKey }));
    return { ok: true, message: KEPT_MESSAGE, fieldErrors: {}, data: { kept: true } } as S;
  };
  return async (prev, formData) => {
    if (typeof navigator !== "undefined" && navigator.onLine === false) {
      const kept = await keepIt(formData);
      if (kept) return kept;
    }
    try {
      return await action(prev, formData);
    } catch (error) {
      if (!isNetworkFailure(error)) throw error;
      const kept = await keepIt(formData);
      if (kept) return kept;
      throw error;
    }
  };
}
