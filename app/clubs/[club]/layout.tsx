import type { Metadata } from "next";
import type { ReactNode } from "react";
import { ClubShell } from "@/components/shell/club-shell";
import { clubNavItems } from "@/components/shell/nav-items";
import { AbilityBoundary } from "@/components/ability-boundary";
import { listClubsForUser } from "@/db/queries/clubs";
import { requireClubContext, resolveClubContext } from "@/lib/server/club-context";
import { RampMode } from "@/components/ramp/ramp-mode";

// Every page of a club is titled "<Page> · <Club> · Hangarline" (the page sets its own title). The
// club's name goes into the title only for someone who may see the club; anyone else gets the bare
// product name, exactly as for a club that does not exist.
export async function generateMetadata({ params }: { params: Promise<{ club: string }> }): Promise<Metadata> {
  const { club: slug } = await params;
  const result = await resolveClubContext(slug);
  if (!result.ok) return { title: { absolute: "Hangarline", template: "%s · Hangarline" } };
  const name = result.ctx.club.name;
  return { title: { default: `${name} · Hangarline`, template: `%s · ${name} · Hangarline` } };
}

export default async function ClubLayout({ children, params }: { children: ReactNode; params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const ctx = await requireClubContext(slug);
  const clubs = listClubsForUser(ctx.db, ctx.user.id);
  return (
    <AbilityBoundary userId={ctx.user.id} roles={ctx.membership.roles}>
      <ClubShell
        club={{ slug: ctx.club.slug, name: ctx.club.name }}
        clubs={clubs}
        nav={clubNavItems(ctx.club.slug, ctx.ability, ctx.user.id)}
        user={{ name: ctx.user.name, email: ctx.user.email }}
        roles={ctx.membership.roles}
        isOperator={ctx.user.platformRole === "operator"}
      >
        {children}
      </ClubShell>
      <RampMode userId={ctx.user.id} />
    </AbilityBoundary>
  );
}
