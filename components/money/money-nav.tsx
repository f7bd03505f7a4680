import Link from "next/link";
import type { AppAbility } from "@/permissions";
import { can, canAll } from "@/permissions";

export function MoneyNav({ slug, ability, current }: { slug: string; ability: AppAbility; current?: string }) {
  const base = `/clubs/${slug}/money`;
  const items = [
    { href: base, label: "Overview", show: true },
    { href: `${base}/journal`, label: "Journal", show: can(ability, "read", "Ledger") },
    { href: `${base}/balances`, label: "Member balances", show: canAll(ability, "read", "Account") },
    { href: `${base}/billing`, label: "Dues and billing", show: can(ability, "read", "Ledger") },
    { href: `${base}/payments`, label: "Payments", show: can(ability, "read", "Payment") || canAll(ability, "read", "Account") },
    { href: `${base}/reconciliation`, label: "Bank reconciliation", show: can(ability, "read", "Reconciliation") },
    { href: `${base}/ageing`, label: "Ageing", show: canAll(ability, "read", "Account") },
    { href: `${base}/rates`, label: "Hourly rates", show: can(ability, "read", "Rates") },
    { href: `${base}/bills`, label: "Bills", show: can(ability, "read", "Bill") },
    { href: `${base}/reports/profit-and-loss`, label: "Reports", show: can(ability, "read", "Ledger") },
    { href: `${base}/accounts`, label: "Chart of accounts", show: can(ability, "read", "Ledger") },
    { href: `${base}/meter-gaps`, label: "Meter gaps", show: can(ability, "read", "Ledger") },
  ].filter((i) => i.show);
  return (
    <nav aria-label="Money sections" className="mb-5 overflow-x-auto">
      <ul className="flex min-w-max gap-1 border-b border-sand-300">
        {items.map((i) => {
          const active = current === i.href;
          return (
            <li key={i.href}>
              <Link href={i.href} aria-current={active ? "page" : undefined} className={`block rounded-t px-3 py-2 text-sm font-bold no-underline ${active ? "border border-b-0 border-sand-300 bg-white text-ink-900" : "text-fin-600 hover:bg-sand-200"}`}>
                {i.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
