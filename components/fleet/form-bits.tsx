import type { InputHTMLAttributes, ReactNode } from "react";

/** A checkbox with its label and its own error line. */
export function CheckboxField({ label, name, errors, hint, ...input }: { label: ReactNode; name: string; errors?: string[]; hint?: ReactNode } & InputHTMLAttributes<HTMLInputElement>) {
  const id = input.id ?? `f-${name}`;
  return (
    <div className="mb-4">
      <label htmlFor={id} className="flex items-start gap-2">
        <input id={id} name={name} type="checkbox" className="mt-1 h-5 w-5 shrink-0" aria-invalid={errors?.length ? true : undefined} aria-describedby={errors?.length ? `${id}-error` : undefined} {...input} />
        <span>{label}</span>
      </label>
      {hint && !errors?.length ? <p className="mt-1 pl-7 text-sm text-ink-500">{hint}</p> : null}
      {errors?.length ? <p id={`${id}-error`} className="field-error pl-7">{errors.join(" ")}</p> : null}
    </div>
  );
}

export function TextAreaField({ label, name, errors, hint, rows = 3, ...rest }: { label: string; name: string; errors?: string[]; hint?: ReactNode; rows?: number; required?: boolean; defaultValue?: string; placeholder?: string; id?: string }) {
  const id = rest.id ?? `f-${name}`;
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <textarea id={id} name={name} rows={rows} className="field-input" aria-invalid={errors?.length ? true : undefined} aria-describedby={errors?.length ? `${id}-error` : undefined} {...rest} />
      {hint && !errors?.length ? <p className="mt-1 text-sm text-ink-500">{hint}</p> : null}
      {errors?.length ? <p id={`${id}-error`} className="field-error">{errors.join(" ")}</p> : null}
    </div>
  );
}

export function FileField({ label, name, errors, hint, accept, multiple, capture, id }: { label: string; name: string; errors?: string[]; hint?: ReactNode; accept: string; multiple?: boolean; capture?: "environment" | "user"; id?: string }) {
  const fieldId = id ?? `f-${name}`;
  return (
    <div className="mb-4">
      <label htmlFor={fieldId} className="field-label">{label}</label>
      <input id={fieldId} name={name} type="file" accept={accept} multiple={multiple} capture={capture} className="block w-full max-w-full text-sm file:mr-3 file:min-h-11 file:rounded file:border file:border-fin-600 file:bg-white file:px-3 file:font-bold file:text-fin-600" aria-invalid={errors?.length ? true : undefined} aria-describedby={errors?.length ? `${fieldId}-error` : undefined} />
      {hint && !errors?.length ? <p className="mt-1 text-sm text-ink-500">{hint}</p> : null}
      {errors?.length ? <p id={`${fieldId}-error`} className="field-error" role="alert">{errors.join(" ")}</p> : null}
    </div>
  );
}
