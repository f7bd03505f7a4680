import Link from "next/link";
import { type AppAbility, can, canOn } from "@/permissions";

/** The safety area's sections, shown to whoever may use each. */
export function SafetyLinks({ slug, ability, userId }: { slug: string; ability: AppAbility; userId: string }) {
  const base = `/clubs/${slug}`;
  const links = [
    { href: `${base}/safety`, label: "Bulletins", show: can(ability, "read", "Bulletin") },
    { href: `${base}/safety/reports/new`, label: "File a safety report", show: can(ability, "create", "SafetyReport") },
    { href: `${base}/safety/reports`, label: can(ability, "triage", "SafetyReport") ? "Report queue" : "My reports", show: can(ability, "create", "SafetyReport") || can(ability, "triage", "SafetyReport") },
    { href: `${base}/me`, label: "My currency & documents", show: canOn(ability, "read", "Currency", { userId }) },
    { href: `${base}/safety/currency`, label: "Currency board", show: can(ability, "read", "CurrencyBoard") },
    { href: `${base}/safety/checkouts`, label: "Checkouts", show: can(ability, "read", "Checkout") },
  ].filter((l) => l.show);
  return (
    <nav aria-label="Safety sections" className="mb-5 flex flex-wrap gap-2">
      {links.map((l) => (
        <Link key={l.href} href={l.href} className="rounded border border-sand-300 bg-white px-3 py-2 text-sm font-bold no-underline hover:bg-sand-50">{l.label}</Link>
      ))}
    </nav>
  );
}
