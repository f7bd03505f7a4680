import type { Metadata } from "next";
import { dayText } from "@/components/ui/day";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ChangeRolesForm, MembershipStatusForm } from "@/components/members/member-admin-forms";
import { PageHeader } from "@/components/ui/page-header";
import { getMember } from "@/db/queries/members";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Member" };

export default async function MemberPage({ params }: { params: Promise<{ club: string; membershipId: string }> }) {
  const { club: slug, membershipId } = await params;
  const { db, club } = await authorizePage(slug, ["assignRoles", "Member"]);
  const member = getMember(db, club.id, membershipId);
  if (!member) notFound();
  return (
    <div className="max-w-3xl">
      <p className="mb-2 text-sm"><Link href={`/clubs/${club.slug}/members`}>← Members</Link></p>
      <PageHeader title={member.name ?? member.email} lead={`${member.email} · joined ${dayText(member.joinedOn, club.locale)} · ${member.status === "active" ? "active" : "inactive"}`} />
      <section className="card mb-6" aria-labelledby="roles-h">
        <h2 id="roles-h" className="mb-3 text-lg font-bold">Roles in {club.name}</h2>
        <ChangeRolesForm slug={club.slug} membershipId={member.membershipId} roles={member.roles} />
      </section>
      <section className="card" aria-labelledby="status-h">
        <h2 id="status-h" className="mb-2 text-lg font-bold">Membership</h2>
        <p className="mb-3 text-sm text-ink-700">Deactivating ends access to this club. Flights, payments and records stay in the books.</p>
        <MembershipStatusForm slug={club.slug} membershipId={member.membershipId} status={member.status} />
      </section>
    </div>
  );
}
