import type { ReactNode } from "react";
import { buttonClass } from "@/components/ui/button";

/** The submit button of a form sent by useKeptForm (useFormStatus does not see those sends). */
export function PendingButton({ pending, children, pendingText = "Saving…", variant = "primary" }: { pending: boolean; children: ReactNode; pendingText?: string; variant?: "primary" | "secondary" | "danger" }) {
  return (
    <button type="submit" className={buttonClass(variant)} disabled={pending} aria-disabled={pending}>
      {pending ? pendingText : children}
    </button>
  );
}
