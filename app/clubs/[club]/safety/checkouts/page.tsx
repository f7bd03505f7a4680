import { scrollArea } from "@/components/ui/scroll-area";
import { Day } from "@/components/ui/day";
import type { Metadata } from "next";
import { RecordCheckoutForm, RevokeCheckoutForm } from "@/components/safety/checkout-forms";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { listAudienceCandidates } from "@/db/queries/safety-bulletins";
import { listCheckouts, listFleetTypeGroups } from "@/db/queries/safety-checkouts";
import { isoDateInTimeZone } from "@/lib/dates";
import { isClubMember } from "@/lib/safety/audience";
import { explainDenied, can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Checkouts" };

export default async function CheckoutsPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<{ history?: string }> }) {
  const { club: slug } = await params;
  const sp = await searchParams;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "Checkout"]);
  const showHistory = sp.history === "1";
  const rows = listCheckouts(db, club.id, { includeRevoked: showHistory });
  const canRecord = can(ability, "create", "Checkout");
  const canRevoke = can(ability, "update", "Checkout");
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const members = canRecord
    ? listAudienceCandidates(db, club.id).filter((m) => isClubMember(m.roles) && m.userId !== user.id).map((m) => ({ userId: m.userId, label: m.name ? `${m.name} (${m.email})` : m.email }))
    : [];
  return (
    <div className="max-w-6xl">
      <PageHeader title="Checkouts" lead="Who is checked out in which type group, by which instructor and with what conditions. A member checked out in a group may fly any aircraft in it." />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      <p className="mb-3 text-sm">{showHistory ? <a href="?">Show standing checkouts only</a> : <a href="?history=1">Show revoked checkouts too</a>}</p>
      <div className="mb-6 overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Checkouts")}>
        <table className="w-full min-w-[44rem] text-left text-sm">
          <thead className="bg-sand-200">
            <tr><th scope="col" className="px-3 py-2">Member</th><th scope="col" className="px-3 py-2">Type group</th><th scope="col" className="px-3 py-2">Since</th><th scope="col" className="px-3 py-2">Instructor</th><th scope="col" className="px-3 py-2">Conditions</th><th scope="col" className="px-3 py-2">State</th></tr>
          </thead>
          <tbody>
            {rows.map((c) => (
              <tr key={c.id} className="border-t border-sand-200 align-top">
                <td className="px-3 py-2 font-bold">{c.memberName ?? c.memberEmail}</td>
                <td className="px-3 py-2">{c.typeGroup}</td>
                <td className="whitespace-nowrap px-3 py-2 tabular"><Day date={c.checkedOutOn} locale={club.locale} /></td>
                <td className="px-3 py-2">{c.instructorName ?? "—"}<span className="block font-mono text-xs text-ink-500">{c.instructorCertificateNumber}</span></td>
                <td className="px-3 py-2">{c.conditions ?? "None"}</td>
                <td className="px-3 py-2">
                  {c.revokedAt ? (
                    <span className="text-stop-800"><strong>Revoked</strong> {isoDateInTimeZone(c.revokedAt, club.timeZone)} by {c.revokedByName ?? "an instructor"}: {c.revokeReason}</span>
                  ) : (
                    <>
                      <span className="font-bold text-go-800">Standing</span>
                      {canRevoke ? <RevokeCheckoutForm slug={club.slug} checkoutId={c.id} label={`${c.memberName ?? c.memberEmail}, ${c.typeGroup}`} /> : null}
                    </>
                  )}
                </td>
              </tr>
            ))}
            {rows.length === 0 ? <tr><td colSpan={6} className="px-3 py-6 text-center text-ink-500">No checkouts recorded.</td></tr> : null}
          </tbody>
        </table>
      </div>
      <section className="card" aria-labelledby="record-h">
        <h2 id="record-h" className="mb-3 text-lg font-bold">Record a checkout</h2>
        {canRecord ? <RecordCheckoutForm slug={club.slug} members={members} typeGroups={listFleetTypeGroups(db, club.id)} today={today} /> : <p className="text-sm text-ink-500">{explainDenied("create", "Checkout")}</p>}
      </section>
    </div>
  );
}
