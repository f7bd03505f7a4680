"use client";
import { startTransition, useEffect, useRef, type FormEvent } from "react";

/**
 * Submits a form to its action without React's automatic reset, so that a refused submission
 * (a field message, a refused file) keeps everything the person typed — nothing lost. The
 * pressed button's name and value go along (e.g. intent=publish). Without JavaScript the
 * form's own action attribute still works.
 */
export function keepFormOnSubmit(action: (formData: FormData) => void) {
  return (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const submitter = (event.nativeEvent as SubmitEvent).submitter;
    const formData = new FormData(event.currentTarget, submitter instanceof HTMLElement ? submitter : null);
    startTransition(() => action(formData));
  };
}

/** Clears the form after a successful save (and only then). */
export function useResetOnSuccess(state: { ok: boolean }) {
  const ref = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (state.ok) ref.current?.reset();
  }, [state]);
  return ref;
}
