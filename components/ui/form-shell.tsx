"use client";
import { createContext, useContext, type ReactNode } from "react";
import { FormMessage } from "./form-message";
import { IdempotencyKeyField } from "./idempotency-key-field";
import type { FormActionHandle } from "./use-form-action";

const PendingContext = createContext<boolean | null>(null);

/** Whether the surrounding FormShell's submission is waiting for its answer (null outside one). */
export function useFormPending(): boolean | null {
  return useContext(PendingContext);
}

/**
 * Every form that writes: `const form = useFormAction(action)` then
 * `<FormShell form={form} label="…">fields… <SubmitButton>…</SubmitButton></FormShell>`.
 * It renders the <form> (submitted through the hook, never reset by React), its idempotency key,
 * and its answer in one role="status" region (above the fields, or after them with
 * `answer="after"`, or nowhere with `answer="none"` when the caller shows it itself).
 */
export function FormShell({ form, label, className, answer = "before", confirm, children }: {
  form: FormActionHandle<unknown> | FormActionHandle<never>;
  label?: string;
  className?: string;
  answer?: "before" | "after" | "inline-after" | "none";
  /** Asks before sending (window.confirm); nothing is sent when the person declines. */
  confirm?: string;
  children: ReactNode;
}) {
  const handle = form as FormActionHandle<unknown>;
  const message = <FormMessage state={handle.state} answerCount={handle.answerCount} inline={answer === "inline-after"} />;
  return (
    <form
      ref={handle.formRef}
      onSubmit={(event) => {
        if (confirm && !window.confirm(confirm)) {
          event.preventDefault();
          return;
        }
        handle.onSubmit(event);
      }}
      noValidate
      aria-label={label}
      aria-busy={handle.pending || undefined}
      className={className}
    >
      <IdempotencyKeyField answer={handle.state} />
      {answer === "before" ? message : null}
      <PendingContext.Provider value={handle.pending}>{children}</PendingContext.Provider>
      {answer === "after" || answer === "inline-after" ? message : null}
    </form>
  );
}
