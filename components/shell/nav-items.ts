import type { AppAbility } from "@/permissions";
import { can, canOn } from "@/permissions";

export type NavItem = { href: string; label: string; description: string };

// Built from the abilities: a section appears only when the role may read what it shows.
export function clubNavItems(slug: string, ability: AppAbility, userId: string): NavItem[] {
  const base = `/clubs/${slug}`;
  const items: (NavItem & { show: boolean })[] = [
    { href: base, label: "Club home", description: "Notices and what needs you", show: can(ability, "read", "Club") },
    { href: `${base}/flight-line`, label: "Flight line", description: "Which aircraft can fly and why", show: can(ability, "read", "Aircraft") },
    { href: `${base}/maintenance`, label: "Maintenance", description: "Inspections, squawks and repairs", show: can(ability, "record", "Inspection") || can(ability, "triage", "Squawk") },
    { href: `${base}/flights`, label: "Flight log", description: "Meter times and landings", show: can(ability, "read", "Flight") },
    { href: `${base}/bookings`, label: "Bookings", description: "Reserve an aircraft", show: can(ability, "create", "Booking") },
    { href: `${base}/safety`, label: "Safety", description: "Bulletins, reports, currency", show: can(ability, "read", "Bulletin") },
    { href: `${base}/me`, label: "My currency & documents", description: "Currency, medical, documents, checkouts", show: canOn(ability, "read", "Currency", { userId }) },
    { href: `${base}/members`, label: "Members", description: "Roster and roles", show: can(ability, "read", "Member") },
    { href: `${base}/account`, label: "My account", description: "Balance, statements, pay", show: canOn(ability, "pay", "Account", { userId }) },
    { href: `${base}/money`, label: "Money", description: "Ledger, billing and reconciliation", show: can(ability, "read", "Ledger") },
    { href: `${base}/tools`, label: "Pilot tools", description: "Weight and balance, fuel, density altitude", show: can(ability, "read", "Tools") },
    { href: `${base}/settings`, label: "Club settings", description: "Home field position and other rules", show: can(ability, "update", "ClubSettings") },
    { href: `${base}/audit`, label: "Audit log", description: "Every privileged change", show: can(ability, "read", "AuditLog") },
    { href: `${base}/outbox`, label: "Outbox", description: "E-mail sent on the club's behalf", show: can(ability, "read", "Outbox") },
  ];
  return items.filter((i) => i.show).map(({ show: _show, ...i }) => i);
}
