"use client";
import { useFormStatus } from "react-dom";
import type { ReactNode } from "react";
import { buttonClass } from "./button";

export function SubmitButton({ children, pendingText = "Saving…", variant = "primary", disabled, title }: { children: ReactNode; pendingText?: string; variant?: "primary" | "secondary" | "danger"; disabled?: boolean; title?: string }) {
  const { pending } = useFormStatus();
  return (
    <button type="submit" className={buttonClass(variant)} disabled={pending || disabled} aria-disabled={pending || disabled} title={title}>
      {pending ? pendingText : children}
    </button>
  );
}
