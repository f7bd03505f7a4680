import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/page-header";
import { listAuditEntries } from "@/db/queries/audit";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["read", "AuditLog"]);
  const entries = listAuditEntries(db, club);
  return (
    <div className="max-w-4xl">
      <PageHeader title="Audit log" lead={`Every privileged change in this club, newest first, in the club's time (${club.timeZone}). Entries are never edited or removed.`} />
      {entries.length === 0 ? <p className="text-ink-700">Nothing recorded yet.</p> : null}
      <ol className="divide-y divide-sand-200 rounded border border-sand-300 bg-white" aria-label="Audit entries">
        {entries.map((e) => (
          <li key={e.id} className="px-4 py-3">
            <p className="text-sm text-ink-500"><time>{e.when}</time></p>
            <p>{e.sentence}</p>
            {e.details.length ? (
              <ul className="mt-1 list-disc pl-5 text-sm text-ink-700">
                {e.details.map((d, i) => <li key={i} className="break-words">{d}</li>)}
              </ul>
            ) : null}
          </li>
        ))}
      </ol>
    </div>
  );
}
