import { CURRENCY_STATE_LABELS, type CurrencyItem } from "@/lib/safety/currency-summary";
import { CurrencyStateBadge } from "./state-badge";

function until(item: CurrencyItem): string {
  if (!item.lastDay) return item.key.startsWith("passenger") || item.key.startsWith("recency") ? "No qualifying flights logged" : "Nothing recorded";
  return item.state === "expired" ? `Expired after ${item.lastDay}` : `Expires after ${item.lastDay}`;
}

/** What the member's own unverified entries would make of an item: shown, never counted. */
export function ClaimNote({ item }: { item: CurrencyItem }) {
  if (!item.claim) return null;
  return (
    <span className="basis-full text-xs text-ink-700">
      ◇ Claimed, not verified: {CURRENCY_STATE_LABELS[item.claim.state].toLowerCase()}{item.claim.lastDay ? ` through ${item.claim.lastDay}` : ""}. Counts once an instructor or the safety officer verifies it.
    </span>
  );
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
          {item.claim ? <ClaimNote item={item} /> : null}
        </li>
      ))}
    </ul>
  );
}
