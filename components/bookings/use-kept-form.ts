"use client";
import { startTransition, useActionState, type FormEvent } from "react";
import type { ActionState } from "@/lib/actions/action-state";

/**
 * useActionState without React's automatic form reset: the form keeps what the member typed
 * (and the choices in its selects) when the server answers with warnings or field errors, so a
 * resubmit sends exactly what was shown.
 */
export function useKeptForm<R>(action: (prev: ActionState, formData: FormData) => Promise<ActionState<R>>, initial: ActionState) {
  const [state, dispatch, pending] = useActionState(action as (prev: ActionState, formData: FormData) => Promise<ActionState>, initial);
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    startTransition(() => dispatch(data));
  };
  return { state, onSubmit, pending };
}
