import type { CurrencyItem } from "@/lib/safety/currency-summary";
import { CurrencyStateBadge } from "./state-badge";

function until(item: CurrencyItem): string {
  if (!item.lastDay) return item.key.startsWith("passenger") || item.key.startsWith("recency") ? "No qualifying flights logged" : "Nothing recorded";
  return item.state === "expired" ? `Lapsed after ${item.lastDay}` : `Through ${item.lastDay}`;
}

/** One member's currency, item by item: a word, a shape and the last good day. */
export function CurrencyList({ items }: { items: CurrencyItem[] }) {
  return (
    <ul className="divide-y divide-sand-200">
      {items.map((item) => (
        <li key={item.key} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span className="min-w-0 font-bold">{item.label}</span>
          <span className="flex flex-wrap items-center gap-2 text-sm">
            <span className="font-mono tabular text-ink-700">{until(item)}</span>
            <CurrencyStateBadge state={item.state} />
          </span>
        </li>
      ))}
    </ul>
  );
}
