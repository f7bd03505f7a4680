import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";

// The field primitives of every form (DEVELOPERS.md "Forms and their answers"). A field with errors
// is aria-invalid and names its message (and its hint) with aria-describedby; the form's hook focuses
// the first invalid field after a refusal.

type Common = { label: string; name: string; errors?: string[]; hint?: ReactNode };

/** ids of the hint and error lines, and the aria attributes that link them. */
function described(id: string, errors: string[] | undefined, hint: ReactNode) {
  const invalid = Boolean(errors?.length);
  const ids = [invalid ? `${id}-error` : null, hint && !invalid ? `${id}-hint` : null].filter(Boolean).join(" ");
  return { invalid, aria: { "aria-invalid": invalid ? true : undefined, "aria-describedby": ids || undefined } as const };
}

/** `tight`: under a checkbox row, whose own padding already spaces it from the line. */
function Lines({ id, errors, hint, indent = "", tight = false }: { id: string; errors?: string[]; hint?: ReactNode; indent?: string; tight?: boolean }) {
  if (errors?.length) return <p id={`${id}-error`} className={`field-error ${indent} ${tight ? "-mt-1.5" : ""}`}>{errors.join(" ")}</p>;
  return hint ? <p id={`${id}-hint`} className={`${tight ? "-mt-1.5" : "mt-1"} text-sm text-ink-500 ${indent}`}>{hint}</p> : null;
}

export function Field({ label, name, errors, hint, ...input }: Common & InputHTMLAttributes<HTMLInputElement>) {
  const id = input.id ?? `f-${name}`;
  const { aria } = described(id, errors, hint);
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <input id={id} name={name} className="field-input" {...aria} {...input} />
      <Lines id={id} errors={errors} hint={hint} />
    </div>
  );
}

export function SelectField({ label, name, errors, hint, children, ...select }: Common & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = select.id ?? `f-${name}`;
  const { aria } = described(id, errors, hint);
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <select id={id} name={name} className="field-input" {...aria} {...select}>{children}</select>
      <Lines id={id} errors={errors} hint={hint} />
    </div>
  );
}

/** A checkbox with its label and its own error line. */
export function CheckboxField({ label, name, errors, hint, ...input }: { label: ReactNode; name: string; errors?: string[]; hint?: ReactNode } & InputHTMLAttributes<HTMLInputElement>) {
  const id = input.id ?? `f-${name}`;
  const { aria } = described(id, errors, hint);
  return (
    <div className="mb-3">
      {/* The whole row is the touch target: at least 44 px tall (WCAG 2.5.5), the box 24 px. */}
      <label htmlFor={id} className="flex min-h-11 cursor-pointer items-start gap-3 py-2.5">
        <input id={id} name={name} type="checkbox" className="h-6 w-6 shrink-0 cursor-pointer" {...aria} {...input} />
        <span className="min-w-0">{label}</span>
      </label>
      <Lines id={id} errors={errors} hint={hint} indent="pl-9" tight />
    </div>
  );
}

export function TextAreaField({ label, name, errors, hint, rows = 3, ...rest }: Common & { rows?: number } & Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, "name" | "rows">) {
  const id = rest.id ?? `f-${name}`;
  const { aria } = described(id, errors, hint);
  return (
    <div className="mb-4">
      <label htmlFor={id} className="field-label">{label}</label>
      <textarea id={id} name={name} rows={rows} className="field-input" {...aria} {...rest} />
      <Lines id={id} errors={errors} hint={hint} />
    </div>
  );
}

export function FileField({ label, name, errors, hint, accept, multiple, capture, id }: { label: string; name: string; errors?: string[]; hint?: ReactNode; accept: string; multiple?: boolean; capture?: "environment" | "user"; id?: string }) {
  const fieldId = id ?? `f-${name}`;
  const { aria } = described(fieldId, errors, hint);
  return (
    <div className="mb-4">
      <label htmlFor={fieldId} className="field-label">{label}</label>
      <input id={fieldId} name={name} type="file" accept={accept} multiple={multiple} capture={capture} className="block w-full max-w-full text-sm file:mr-3 file:min-h-11 file:rounded file:border file:border-fin-600 file:bg-white file:px-3 file:font-bold file:text-fin-600" {...aria} />
      <Lines id={fieldId} errors={errors} hint={hint} />
    </div>
  );
}
