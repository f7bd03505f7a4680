"use client";
import type { ReactNode } from "react";
import { buttonClass } from "./button";
import { useFormPending } from "./form-shell";

/** The submit button of a FormShell: disabled (with its pending words) only while the answer is awaited. */
export function SubmitButton({ children, pendingText = "Saving…", variant = "primary", disabled, title, name, value, pending: pendingProp }: { children: ReactNode; pendingText?: string; variant?: "primary" | "secondary" | "danger" | "quiet"; disabled?: boolean; title?: string; name?: string; value?: string; pending?: boolean }) {
  const fromShell = useFormPending();
  const pending = pendingProp ?? fromShell ?? false;
  return (
    <button type="submit" name={name} value={value} className={buttonClass(variant)} disabled={pending || disabled} aria-disabled={pending || disabled} title={title}>
      {pending ? pendingText : children}
    </button>
  );
}
