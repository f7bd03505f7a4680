import type { ActionState } from "@/lib/actions/action-state";

/**
 * The answer of a form: one role="status" region, present (empty) before the first answer so that
 * screen readers announce what arrives in it. A refusal is a role="alert" paragraph inside it —
 * one message, not two. `answerCount` (from useFormAction) makes each answer a new paragraph, so a
 * repeated message is announced again.
 */
export function FormMessage({ state, answerCount = 0, inline = false }: { state: ActionState; answerCount?: number; inline?: boolean }) {
  const tone = state.ok ? "border-go-600 bg-go-100 text-go-800" : "border-stop-600 bg-stop-100 text-stop-800";
  const Tag = inline ? "span" : "div";
  const Line = inline ? "span" : "p";
  return (
    <Tag role="status" className={inline ? "text-sm" : undefined}>
      {state.message ? (
        <Line key={answerCount} role={state.ok ? undefined : "alert"} className={inline ? (state.ok ? "text-go-800" : "text-stop-800") : `mb-4 block rounded border px-3 py-2 text-sm ${tone}`}>
          {state.message}
        </Line>
      ) : null}
    </Tag>
  );
}
