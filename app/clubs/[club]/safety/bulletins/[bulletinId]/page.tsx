import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AckPanel } from "@/components/safety/ack-panel";
import { AcknowledgeForm } from "@/components/safety/acknowledge-form";
import { BulletinForm } from "@/components/safety/bulletin-form";
import { BulletinMarkdown } from "@/components/safety/bulletin-markdown";
import { ShapeIcon, UrgencyBadge } from "@/components/safety/status-shapes";
import { buttonClass } from "@/components/ui/button";
import { bulletinAckStats, getAcknowledgement, getBulletin, isUserInAudience, listBulletinVersions } from "@/db/queries/safety-bulletins";
import { listFleetTypeGroups } from "@/db/queries/safety-checkouts";
import { isoDateInTimeZone } from "@/lib/dates";
import { deadlineState } from "@/lib/safety/acknowledgements";
import { audienceLabel } from "@/lib/safety/labels";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Bulletin" };

export default async function BulletinPage({ params, searchParams }: { params: Promise<{ club: string; bulletinId: string }>; searchParams: Promise<{ published?: string; saved?: string }> }) {
  const { club: slug, bulletinId } = await params;
  const sp = await searchParams;
  const { db, club, user, membership, ability } = await authorizePage(slug, ["read", "Bulletin"]);
  const bulletin = getBulletin(db, club.id, bulletinId);
  const writer = can(ability, "create", "Bulletin");
  if (!bulletin || (bulletin.status === "draft" && !writer)) notFound();
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const versions = listBulletinVersions(db, club.id, bulletin.seriesId).filter((v) => v.status === "published" || writer);
  const newer = bulletin.supersededById ? versions.find((v) => v.id === bulletin.supersededById) : undefined;
  const published = bulletin.status === "published";
  const current = published && !bulletin.supersededAt;
  const inAudience = isUserInAudience(db, club.id, bulletin, { userId: user.id, roles: membership.roles });
  const mine = published ? getAcknowledgement(db, club.id, bulletin.id, user.id) : undefined;
  const stats = published && can(ability, "readAcknowledgements", "Bulletin") ? bulletinAckStats(db, club.id, bulletin) : null;
  const deadline = deadlineState(bulletin.acknowledgeBy, today);
  const base = `/clubs/${club.slug}/safety`;
  return (
    <div className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href={base}>← Safety</Link></p>
      {sp.published ? <p role="status" className="mb-4 rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">Published and sent to {sp.published} members through the outbox.</p> : null}
      {sp.saved ? <p role="status" className="mb-4 rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">Draft saved. Nothing was sent yet.</p> : null}
      {newer ? (
        <p role="note" className="mb-4 flex items-center gap-2 rounded border border-sock-500 bg-sock-100 px-3 py-2">
          <ShapeIcon shape="triangle" />This is version {bulletin.version}, replaced by <Link href={`${base}/bulletins/${newer.id}`}>version {newer.version}</Link>. It is kept as it was published.
        </p>
      ) : null}
      <article className="card mb-6">
        <div className="mb-2 flex flex-wrap items-center gap-2">
          <UrgencyBadge urgency={bulletin.urgency} />
          {!published ? <span className="rounded border border-ask-600 bg-ask-100 px-2 py-0.5 text-xs font-bold text-ask-800">Draft — not sent</span> : null}
          <span className="text-sm text-ink-500">Version {bulletin.version}</span>
        </div>
        <h1 className="text-2xl font-bold sm:text-3xl">{bulletin.title}</h1>
        <p className="mb-4 mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-700">
          <span>For: {audienceLabel(bulletin.audience, bulletin.audienceTypeGroup)}</span>
          {bulletin.publishedAt ? <span>Published {isoDateInTimeZone(bulletin.publishedAt, club.timeZone)}</span> : null}
          {bulletin.acknowledgeBy ? (
            <span className={deadline === "overdue" ? "inline-flex items-center gap-1 font-bold text-stop-800" : ""}>
              {deadline === "overdue" ? <ShapeIcon shape="octagon" /> : null}Acknowledge by {bulletin.acknowledgeBy}{deadline === "overdue" ? " (passed)" : ""}
            </span>
          ) : null}
        </p>
        <BulletinMarkdown markdown={bulletin.bodyMarkdown} />
        {bulletin.attachmentUploadId ? (
          <p className="mt-3"><a href={`/api/clubs/${club.slug}/uploads/${bulletin.attachmentUploadId}`} target="_blank" rel="noopener">Open the attachment</a></p>
        ) : null}
        {published ? (
          <div className="mt-5 border-t border-sand-200 pt-4">
            {mine ? (
              <p className="inline-flex items-center gap-2 font-bold text-go-800"><ShapeIcon shape="check" />You acknowledged this on {isoDateInTimeZone(mine.acknowledgedAt, club.timeZone)}.</p>
            ) : !current ? (
              <p className="text-ink-700">This version has been replaced; acknowledge the newest version instead.</p>
            ) : inAudience && can(ability, "acknowledge", "Bulletin") ? (
              <AcknowledgeForm slug={club.slug} bulletinId={bulletin.id} />
            ) : (
              <p className="text-ink-700">Addressed to {audienceLabel(bulletin.audience, bulletin.audienceTypeGroup).toLowerCase()}; you are not asked to acknowledge it.</p>
            )}
          </div>
        ) : null}
      </article>
      {current && writer ? (
        <p className="mb-6"><Link href={`${base}/bulletins/new?revise=${bulletin.id}`} className={buttonClass("secondary", "no-underline")}>Issue a revision</Link></p>
      ) : null}
      {!published && writer ? (
        <section className="card mb-6" aria-labelledby="edit-h">
          <h2 id="edit-h" className="mb-3 text-lg font-bold">Edit the draft</h2>
          <BulletinForm slug={club.slug} typeGroups={listFleetTypeGroups(db, club.id)} canPublish={can(ability, "publish", "Bulletin")} initial={bulletin} bulletinId={bulletin.id} today={today} />
        </section>
      ) : null}
      {stats ? (
        <div className="mb-6">
          <AckPanel
            timeZone={club.timeZone}
            slug={club.slug}
            bulletinId={bulletin.id}
            current={current}
            canExport={can(ability, "export", "Bulletin")}
            canRemind={can(ability, "publish", "Bulletin")}
            initial={{ ...stats, rows: stats.rows.map((r) => ({ ...r, acknowledgedAt: r.acknowledgedAt?.toISOString() ?? null })) }}
          />
        </div>
      ) : null}
      {versions.length > 1 ? (
        <section className="card" aria-labelledby="versions-h">
          <h2 id="versions-h" className="mb-2 text-lg font-bold">Versions</h2>
          <ol className="flex flex-col gap-1">
            {versions.map((v) => (
              <li key={v.id}>
                {v.id === bulletin.id ? <strong>Version {v.version} (this page)</strong> : <Link href={`${base}/bulletins/${v.id}`}>Version {v.version}</Link>}
                <span className="text-sm text-ink-500"> · {v.status === "draft" ? "draft" : v.supersededAt ? `published ${(v.publishedAt ? isoDateInTimeZone(v.publishedAt, club.timeZone) : "")}, replaced ${isoDateInTimeZone(v.supersededAt, club.timeZone)}` : `published ${(v.publishedAt ? isoDateInTimeZone(v.publishedAt, club.timeZone) : "")}, current`}</span>
              </li>
            ))}
          </ol>
        </section>
      ) : null}
    </div>
  );
}
