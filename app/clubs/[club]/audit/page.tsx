import { PageHeader } from "@/components/ui/page-header";
import { listAudit } from "@/db/queries/members";
import { formatLocalTime } from "@/lib/fleet/time";
import { authorizePage } from "@/lib/server/authorize";

function summarise(value: unknown): string {
  if (value === null || value === undefined) return "—";
  return JSON.stringify(value);
}

export default async function AuditPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["read", "AuditLog"]);
  const rows = listAudit(db, club.id);
  return (
    <div className="max-w-6xl">
      <PageHeader title="Audit log" lead="Every privileged change in this club, newest first. Entries are never edited or removed." />
      <div className="overflow-x-auto rounded border border-sand-300 bg-white">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <thead className="bg-sand-200"><tr><th className="px-3 py-2">When (club time)</th><th className="px-3 py-2">Who</th><th className="px-3 py-2">What</th><th className="px-3 py-2">Before</th><th className="px-3 py-2">After</th></tr></thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-t border-sand-200 align-top">
                <td className="px-3 py-2 font-mono tabular">{formatLocalTime(r.createdAt, club.timeZone)}</td>
                <td className="px-3 py-2">{r.actorName ?? r.actorEmail ?? "system"}</td>
                <td className="px-3 py-2"><code>{r.action}</code> <span className="text-ink-500">{r.subjectType}</span></td>
                <td className="max-w-xs break-all px-3 py-2 font-mono text-xs">{summarise(r.before)}</td>
                <td className="max-w-xs break-all px-3 py-2 font-mono text-xs">{summarise(r.after)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
