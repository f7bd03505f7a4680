"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { type ReactNode } from "react";
import { CheckboxField, Field, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/action-state";

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

export function FieldOf({ spec, errors }: { spec: FieldSpec; errors?: string[] }) {
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
    return <CheckboxField label={<span className="font-bold text-ink-700">{label}</span>} name={name} defaultChecked={checked} errors={errors} hint={hint} />;
  }
  if (type === "textarea") {
    return <TextAreaField label={label} name={name} defaultValue={defaultValue} className="field-input min-h-24" errors={errors} hint={hint} />;
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
  const form = useFormAction(action);
  const { state } = form;
  const hiddenErrors = Object.entries(state.fieldErrors).filter(([k]) => !fields.some((f) => f.name === k)).flatMap(([, v]) => v);
  return (
    <FormShell form={form} label={label}>
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
    </FormShell>
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
  const form = useFormAction(action);
  const { state } = form;
  const errors = Object.values(state.fieldErrors).flat();
  return (
    <FormShell form={form} className="inline-flex flex-wrap items-center gap-2" answer="inline-after" confirm={confirm}>
      <input type="hidden" name="club" value={slug} />
      {Object.entries(hidden).map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <SubmitButton variant={variant} pendingText={pendingText}>{label}</SubmitButton>
      {errors.length && !state.ok ? <span className="text-sm text-stop-800">{errors.join(" ")}</span> : null}
    </FormShell>
  );
}
