import type { Metadata } from "next";
import Link from "next/link";
import { BulletinList } from "@/components/safety/bulletin-list";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { bulletinAckStats, getBulletin, listBulletins, listBulletinsToAcknowledge } from "@/db/queries/safety-bulletins";
import { isoDateInTimeZone } from "@/lib/dates";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Safety" };

export default async function SafetyPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, membership, ability } = await authorizePage(slug, ["read", "Bulletin"]);
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const writer = can(ability, "create", "Bulletin");
  const seesAcks = can(ability, "readAcknowledgements", "Bulletin");
  const toAck = new Set(listBulletinsToAcknowledge(db, club.id, { userId: user.id, roles: membership.roles }).map((b) => b.id));
  const all = listBulletins(db, club.id, { includeDrafts: writer });
  const rows = all.map((b) => {
    const stats = seesAcks && b.status === "published" ? bulletinAckStats(db, club.id, getBulletin(db, club.id, b.id)!) : null;
    return { ...b, mine: toAck.has(b.id), stats: stats ? { acknowledged: stats.acknowledged, audience: stats.audience } : null };
  });
  const drafts = rows.filter((r) => r.status === "draft");
  const published = rows.filter((r) => r.status === "published");
  return (
    <div className="max-w-5xl">
      <PageHeader
        title="Safety"
        lead="Bulletins from the safety officer, confidential reports, currency and checkouts."
        actions={writer ? <Link href={`/clubs/${club.slug}/safety/bulletins/new`} className="inline-flex min-h-11 items-center rounded bg-fin-600 px-4 py-2 font-bold text-white no-underline hover:bg-fin-700">New bulletin</Link> : null}
      />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      {toAck.size > 0 ? (
        <p role="status" className="mb-4 rounded border border-sock-500 bg-sock-100 px-3 py-2">
          {toAck.size === 1 ? "One bulletin is" : `${toAck.size} bulletins are`} waiting for your acknowledgement.
        </p>
      ) : null}
      {writer && drafts.length ? (
        <section aria-labelledby="drafts-h" className="mb-6">
          <h2 id="drafts-h" className="mb-2 text-lg font-bold">Drafts (not sent)</h2>
          <BulletinList slug={club.slug} timeZone={club.timeZone} rows={drafts} today={today} />
        </section>
      ) : null}
      <section aria-labelledby="bulletins-h">
        <h2 id="bulletins-h" className="mb-2 text-lg font-bold">Current bulletins</h2>
        {published.length ? <BulletinList slug={club.slug} timeZone={club.timeZone} rows={published} today={today} /> : <p className="card text-ink-500">No bulletins yet.</p>}
      </section>
    </div>
  );
}
