import type { Metadata } from "next";
import { OutboxTable } from "@/components/outbox-table";
import { PageHeader } from "@/components/ui/page-header";
import { listClubOutbox } from "@/db/queries/outbox";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Outbox" };

export default async function OutboxPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["read", "Outbox"]);
  const rows = listClubOutbox(db, club.id).map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), sentAt: r.sentAt?.toISOString() ?? null }));
  return (
    <div className="max-w-6xl">
      <PageHeader title="Outbox" lead="Every e-mail sent on the club's behalf. Messages wait here and are retried until the provider takes them." />
      <OutboxTable slug={club.slug} initial={rows} timeZone={club.timeZone} />
    </div>
  );
}
