import type { Metadata } from "next";
import { isoDateInTimeZone } from "@/lib/dates";
import { Suspense } from "react";
import { InviteForm } from "@/components/members/invite-form";
import { RevokeInvitationButton } from "@/components/members/member-admin-forms";
import { MembersTable } from "@/components/members/members-table";
import { PageHeader } from "@/components/ui/page-header";
import { listMembers, listOpenInvitations } from "@/db/queries/members";
import { ROLE_LABELS, explainDenied, can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Member"]);
  const rows = listMembers(db, club.id);
  const canInvite = can(ability, "invite", "Member");
  const invitations = canInvite ? listOpenInvitations(db, club.id) : [];
  return (
    <div className="max-w-6xl">
      <PageHeader title="Members" lead={`${rows.filter((r) => r.status === "active").length} active members of ${club.name}.`} />
      <Suspense fallback={<div className="h-40 animate-pulse rounded bg-sand-200" />}>
        <MembersTable rows={rows} slug={club.slug} canManage={can(ability, "assignRoles", "Member")} />
      </Suspense>
      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        <section className="card" aria-labelledby="invite-h">
          <h2 id="invite-h" className="mb-3 text-lg font-bold">Invite someone</h2>
          {canInvite ? <InviteForm slug={club.slug} /> : <p className="text-sm text-ink-500">{explainDenied("invite", "Member")}</p>}
        </section>
        {canInvite ? (
          <section className="card" aria-labelledby="open-inv-h">
            <h2 id="open-inv-h" className="mb-3 text-lg font-bold">Open invitations</h2>
            {invitations.length === 0 ? <p className="text-ink-500">None waiting.</p> : null}
            <ul className="divide-y divide-sand-200">
              {invitations.map((inv) => (
                <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                  <span className="min-w-0 break-all"><strong>{inv.email}</strong><span className="block text-sm text-ink-500">{inv.roles.map((r) => ROLE_LABELS[r]).join(", ")} · until {isoDateInTimeZone(inv.expiresAt, club.timeZone)}</span></span>
                  <RevokeInvitationButton slug={club.slug} invitationId={inv.id} />
                </li>
              ))}
            </ul>
          </section>
        ) : null}
      </div>
    </div>
  );
}
