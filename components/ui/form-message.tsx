import type { ActionState } from "@/lib/actions/action-state";

export function FormMessage({ state }: { state: ActionState }) {
  if (!state.message) return null;
  return (
    <p role={state.ok ? "status" : "alert"} className={`mb-4 rounded border px-3 py-2 text-sm ${state.ok ? "border-go-600 bg-go-100 text-go-800" : "border-stop-600 bg-stop-100 text-stop-800"}`}>
      {state.message}
    </p>
  );
}
