"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import { useQuery } from "@tanstack/react-query";
import { formatInstantWords } from "@/lib/dates/words";
import { ShapeIcon } from "./status-shapes";
import { RemindForm } from "./publish-draft-form";

export type AckSnapshot = {
  audience: number;
  acknowledged: number;
  outstanding: number;
  percent: number;
  rows: { userId: string; name: string | null; email: string; acknowledgedAt: string | null }[];
};

/** Who has and has not acknowledged; refreshes itself so the count moves as members acknowledge. */
export function AckPanel({ slug, bulletinId, initial, canExport, canRemind, current, timeZone }: { slug: string; bulletinId: string; initial: AckSnapshot; canExport: boolean; canRemind: boolean; current: boolean; timeZone: string }) {
  const { data } = useQuery({
    queryKey: ["bulletin-acks", slug, bulletinId],
    queryFn: async () => {
      const res = await fetch(`/api/clubs/${slug}/safety/bulletins/${bulletinId}/acknowledgements`, { cache: "no-store" });
      if (!res.ok) throw new Error(`Acknowledgements ${res.status}`);
      return (await res.json()) as AckSnapshot;
    },
    initialData: initial,
    refetchInterval: 5000,
  });
  return (
    <section className="card" aria-labelledby="acks-h">
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="acks-h" className="text-lg font-bold">Acknowledgements</h2>
          <p className="text-ink-700" data-testid="ack-count" aria-live="polite">
            <strong className="tabular">{data.acknowledged} of {data.audience}</strong> acknowledged ({data.percent} %) · {data.outstanding} outstanding
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          {canExport ? <a className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 py-2 font-bold text-fin-600 no-underline hover:bg-sand-50" href={`/api/clubs/${slug}/safety/bulletins/${bulletinId}/acknowledgements/export`}>Export CSV</a> : null}
        </div>
      </div>
      <div className="mb-3 h-2 overflow-hidden rounded bg-sand-200" aria-hidden="true"><div className="h-full bg-go-600" style={{ width: `${data.percent}%` }} /></div>
      {canRemind && current ? <div className="mb-3"><RemindForm slug={slug} bulletinId={bulletinId} outstanding={data.outstanding} /></div> : null}
      <div className="overflow-x-auto rounded border border-sand-300" {...scrollArea("Acknowledgements")}>
        <table className="w-full min-w-[28rem] text-left text-sm">
          <thead className="bg-sand-200"><tr><th scope="col" className="px-3 py-2">Member</th><th scope="col" className="px-3 py-2">State</th><th scope="col" className="px-3 py-2">When (UTC)</th></tr></thead>
          <tbody>
            {data.rows.map((r) => (
              <tr key={r.userId} className="border-t border-sand-200">
                <td className="px-3 py-2"><span className="font-bold">{r.name ?? r.email}</span><span className="block break-all text-xs text-ink-500">{r.email}</span></td>
                <td className="px-3 py-2">
                  {r.acknowledgedAt ? (
                    <span className="inline-flex items-center gap-1 text-go-800"><ShapeIcon shape="check" />Acknowledged</span>
                  ) : (
                    <span className="inline-flex items-center gap-1 text-sock-700"><ShapeIcon shape="ring" />Not yet</span>
                  )}
                </td>
                <td className="whitespace-nowrap px-3 py-2 font-mono tabular">{r.acknowledgedAt ? formatInstantWords(r.acknowledgedAt, timeZone) : "—"}</td>
              </tr>
            ))}
            {data.rows.length === 0 ? <tr><td colSpan={3} className="px-3 py-4 text-center text-ink-500">Nobody is in this audience.</td></tr> : null}
          </tbody>
        </table>
      </div>
    </section>
  );
}
