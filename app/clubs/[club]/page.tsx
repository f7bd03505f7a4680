import type { Metadata } from "next";
import Link from "next/link";
import { Fragment, type ReactNode } from "react";
import { HomeCurrency } from "@/components/currency/home-currency";
import { HomeFleet } from "@/components/fleet/home-fleet";
import { HomeAccount } from "@/components/money/home-account";
import { HomeBulletins } from "@/components/safety/home-bulletins";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";
import { ROLE_LABELS, can, canOn } from "@/permissions";

export const metadata: Metadata = { title: "Club home" };

export default async function ClubHome({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, membership, ability } = await authorizePage(slug); // every person with a role in the club; each tile checks its own permission
  const base = `/clubs/${club.slug}`;
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const tiles: { title: string; body?: string; href?: string; node?: ReactNode; show: boolean }[] = [
    { title: "Flight line", node: <HomeFleet db={db} club={club} />, show: can(ability, "read", "Aircraft") },
    { title: "Safety bulletins", node: <HomeBulletins db={db} clubId={club.id} slug={club.slug} userId={user.id} roles={membership.roles} today={today} />, show: can(ability, "read", "Bulletin") },
    { title: "Your currency", node: <HomeCurrency db={db} club={club} userId={user.id} today={today} />, show: canOn(ability, "read", "Currency", { userId: user.id }) },
    { title: "Your account", node: <HomeAccount db={db} club={club} userId={user.id} today={today} />, show: canOn(ability, "read", "Account", { userId: user.id }) },
    { title: "Members", body: "The roster, roles and invitations.", href: `${base}/members`, show: can(ability, "read", "Member") },
  ].filter((t) => t.show);
  return (
    <div className="max-w-5xl">
      <PageHeader title={club.name} lead={`Welcome, ${user.name ?? user.email}. You are here as ${membership.roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(", ")}.`} />
      <SafetyCaution />
      <section aria-label="At a glance" className="mt-5 grid gap-4 sm:grid-cols-2">
        {tiles.map((tile) => tile.node ? <Fragment key={tile.title}>{tile.node}</Fragment> : (
          <article key={tile.title} className="card">
            <h2 className="text-lg font-bold">{tile.href ? <Link href={tile.href}>{tile.title}</Link> : tile.title}</h2>
            <p className="mt-1 text-ink-700">{tile.body}</p>
          </article>
        ))}
      </section>
      <p className="mt-6 text-sm text-ink-500">Club time zone {club.timeZone} · amounts in {club.currency} · {club.unitSystem === "metric" ? "litres and kilograms" : "US gallons and pounds"}</p>
    </div>
  );
}
