import { ShapeIcon } from "@/components/safety/status-shapes";
import { CURRENCY_STATE_LABELS, type CurrencyState } from "@/lib/safety/currency-summary";

const LOOK: Record<CurrencyState, { shape: "check" | "triangle" | "cross" | "dashed"; cls: string }> = {
  current: { shape: "check", cls: "border-go-600 bg-go-100 text-go-800" },
  expiring: { shape: "triangle", cls: "border-sock-500 bg-sock-100 text-sock-700" },
  expired: { shape: "cross", cls: "border-stop-600 bg-stop-100 text-stop-800" },
  missing: { shape: "dashed", cls: "border-ask-600 bg-ask-100 text-ask-800" },
};

export function CurrencyStateBadge({ state }: { state: CurrencyState }) {
  const look = LOOK[state];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-xs font-bold ${look.cls}`}>
      <ShapeIcon shape={look.shape} />
      {CURRENCY_STATE_LABELS[state]}
    </span>
  );
}
