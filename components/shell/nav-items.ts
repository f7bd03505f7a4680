import type { AppAbility } from "@/permissions";

export type NavItem = { href: string; label: string; description: string };

// Built from the abilities: a section appears only when the role may read what it shows.
export function clubNavItems(slug: string, ability: AppAbility): NavItem[] {
  const base = `/clubs/${slug}`;
  const items: (NavItem & { show: boolean })[] = [
    { href: base, label: "Club home", description: "Notices and what needs you", show: ability.can("read", "Club") },
    { href: `${base}/flight-line`, label: "Flight line", description: "Which aircraft can fly and why", show: ability.can("read", "Aircraft") },
    { href: `${base}/maintenance`, label: "Maintenance", description: "Inspections, squawks, return to service", show: ability.can("record", "Inspection") || ability.can("triage", "Squawk") },
    { href: `${base}/flights`, label: "Flight log", description: "Meter times and landings", show: ability.can("read", "Flight") },
    { href: `${base}/bookings`, label: "Bookings", description: "Reserve an aircraft", show: ability.can("create", "Booking") },
    { href: `${base}/safety`, label: "Safety", description: "Bulletins, reports, currency", show: ability.can("read", "Bulletin") },
    { href: `${base}/me`, label: "My currency & documents", description: "Currency, medical, documents, checkouts", show: ability.can("read", "Currency") },
    { href: `${base}/members`, label: "Members", description: "Roster and roles", show: ability.can("read", "Member") },
    { href: `${base}/account`, label: "My account", description: "Balance, statements, pay", show: ability.can("pay", "Account") },
    { href: `${base}/money`, label: "Money", description: "Ledger, billing and reconciliation", show: ability.can("read", "Ledger") },
    { href: `${base}/tools`, label: "Pilot tools", description: "Weight and balance, fuel, density altitude", show: ability.can("read", "Tools") },
    { href: `${base}/audit`, label: "Audit log", description: "Every privileged change", show: ability.can("read", "AuditLog") },
    { href: `${base}/outbox`, label: "Outbox", description: "E-mail sent on the club's behalf", show: ability.can("read", "Outbox") },
  ];
  return items.filter((i) => i.show).map(({ show: _show, ...i }) => i);
}
