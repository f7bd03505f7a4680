import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type Common = { label: string; name: string; errors?: string[]; hint?: ReactNode };

export function Field({ label, name, errors, hint, ...input }: Common & InputHTMLAttributes<HTMLInputElement>) {
  const id = input.id ?? `f-${name}`;
  const describedBy = errors?.length ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <input id={id} name={name} className="field-input" aria-invalid={errors?.length ? true : undefined} aria-describedby={describedBy} {...input} />
      {hint && !errors?.length ? <p id={`${id}-hint`} className="mt-1 text-sm text-ink-500">{hint}</p> : null}
      {errors?.length ? <p id={`${id}-error`} className="field-error">{errors.join(" ")}</p> : null}
    </div>
  );
}

export function SelectField({ label, name, errors, hint, children, ...select }: Common & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = select.id ?? `f-${name}`;
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <select id={id} name={name} className="field-input" aria-invalid={errors?.length ? true : undefined} {...select}>{children}</select>
      {hint && !errors?.length ? <p className="mt-1 text-sm text-ink-500">{hint}</p> : null}
      {errors?.length ? <p className="field-error">{errors.join(" ")}</p> : null}
    </div>
  );
}
