import Link from "next/link";
import { own, type AppAbility } from "@/permissions";

/** The safety area's sections, shown to whoever may use each. */
export function SafetyLinks({ slug, ability, userId }: { slug: string; ability: AppAbility; userId?: string }) {
  const base = `/clubs/${slug}`;
  const links = [
    { href: `${base}/safety`, label: "Bulletins", show: ability.can("read", "Bulletin") },
    { href: `${base}/safety/reports/new`, label: "File a safety report", show: ability.can("create", "SafetyReport") },
    { href: `${base}/safety/reports`, label: ability.can("triage", "SafetyReport") ? "Report queue" : "My reports", show: ability.can("create", "SafetyReport") || ability.can("triage", "SafetyReport") },
    { href: `${base}/me`, label: "My currency & documents", show: userId ? ability.can("read", own("Currency", userId)) : ability.can("read", "Currency") },
    { href: `${base}/safety/currency`, label: "Currency board", show: ability.can("read", "CurrencyBoard") },
    { href: `${base}/safety/checkouts`, label: "Checkouts", show: ability.can("read", "Checkout") },
  ].filter((l) => l.show);
  return (
    <nav aria-label="Safety sections" className="mb-5 flex flex-wrap gap-2">
      {links.map((l) => (
        <Link key={l.href} href={l.href} className="rounded border border-sand-300 bg-white px-3 py-2 text-sm font-bold no-underline hover:bg-sand-50">{l.label}</Link>
      ))}
    </nav>
  );
}
