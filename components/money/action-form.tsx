"use client";
import { useActionState, type ReactNode } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export type ServerAction = (prev: ActionState, formData: FormData) => Promise<ActionState>;

export type FieldSpec = {
  name: string;
  label: string;
  type?: "text" | "date" | "month" | "number" | "select" | "checkbox" | "file" | "textarea";
  options?: { value: string; label: string }[];
  defaultValue?: string;
  hint?: string;
  placeholder?: string;
  inputMode?: "decimal" | "numeric" | "text";
  accept?: string;
  checked?: boolean;
};

function FieldOf({ spec, errors }: { spec: FieldSpec; errors?: string[] }) {
  const { name, label, type = "text", options = [], defaultValue, hint, placeholder, inputMode, accept, checked } = spec;
  if (type === "select") {
    return (
      <SelectField label={label} name={name} defaultValue={defaultValue} errors={errors} hint={hint}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>{o.label}</option>
        ))}
      </SelectField>
    );
  }
  if (type === "checkbox") {
    return (
      <div className="mb-4">
        <label className="flex items-center gap-2">
          <input type="checkbox" name={name} defaultChecked={checked} className="size-4" />
          <span className="font-bold text-ink-700">{label}</span>
        </label>
        {errors?.length ? <p className="field-error">{errors.join(" ")}</p> : hint ? <p className="mt-1 text-sm text-ink-500">{hint}</p> : null}
      </div>
    );
  }
  if (type === "textarea") {
    const id = `f-${name}`;
    return (
      <div className="mb-4">
        <label htmlFor={id} className="field-label">{label}</label>
        <textarea id={id} name={name} defaultValue={defaultValue} className="field-input min-h-24" aria-invalid={errors?.length ? true : undefined} />
        {errors?.length ? <p className="field-error">{errors.join(" ")}</p> : null}
      </div>
    );
  }
  return <Field label={label} name={name} type={type} defaultValue={defaultValue} errors={errors} hint={hint} placeholder={placeholder} inputMode={inputMode} accept={accept} />;
}

/**
 * A form for one server action, its fields described as data so server pages can declare
 * them. Field errors from the action's zod schema appear under each field.
 */
export function ActionForm({ action, slug, fields, hidden = {}, submitLabel, pendingText, label, grid = false, children }: {
  action: ServerAction;
  slug: string;
  fields: FieldSpec[];
  hidden?: Record<string, string>;
  submitLabel: string;
  pendingText?: string;
  label: string;
  grid?: boolean;
  children?: ReactNode;
}) {
  const [state, formAction] = useActionState(action, initialActionState);
  const hiddenErrors = Object.entries(state.fieldErrors).filter(([k]) => !fields.some((f) => f.name === k)).flatMap(([, v]) => v);
  return (
    <form action={formAction} noValidate aria-label={label} key={state.ok ? `${state.message}-done` : "form"}>
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      {hiddenErrors.length && !state.ok ? <p className="field-error mb-3">{hiddenErrors.join(" ")}</p> : null}
      <input type="hidden" name="club" value={slug} />
      {Object.entries(hidden).map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <div className={grid ? "grid gap-x-4 sm:grid-cols-2" : undefined}>
        {fields.map((f) => (
          <FieldOf key={f.name} spec={f} errors={state.fieldErrors[f.name]} />
        ))}
      </div>
      {children}
      <SubmitButton pendingText={pendingText}>{submitLabel}</SubmitButton>
    </form>
  );
}

/** One button that runs an action with fixed values, with its outcome beside it. */
export function ActionButton({ action, slug, hidden = {}, label, pendingText, variant = "secondary", confirm }: {
  action: ServerAction;
  slug: string;
  hidden?: Record<string, string>;
  label: string;
  pendingText?: string;
  variant?: "primary" | "secondary" | "danger";
  confirm?: string;
}) {
  const [state, formAction] = useActionState(action, initialActionState);
  const errors = Object.values(state.fieldErrors).flat();
  return (
    <form
      action={formAction}
      className="inline-flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        if (confirm && !window.confirm(confirm)) e.preventDefault();
      }}
    >
      <IdempotencyKeyField answer={state} />
      <input type="hidden" name="club" value={slug} />
      {Object.entries(hidden).map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <SubmitButton variant={variant} pendingText={pendingText}>{label}</SubmitButton>
      {state.message ? (
        <span role={state.ok ? "status" : "alert"} className={`text-sm ${state.ok ? "text-go-800" : "text-stop-800"}`}>
          {state.message}
          {errors.length && !state.ok ? ` ${errors.join(" ")}` : ""}
        </span>
      ) : null}
    </form>
  );
}
