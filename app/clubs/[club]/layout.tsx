import type { ReactNode } from "react";
import { ClubShell } from "@/components/shell/club-shell";
import { clubNavItems } from "@/components/shell/nav-items";
import { AbilityBoundary } from "@/components/ability-boundary";
import { listClubsForUser } from "@/db/queries/clubs";
import { requireClubContext } from "@/lib/server/club-context";
import { RampMode } from "@/components/ramp/ramp-mode";

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
