"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import { useQuery } from "@tanstack/react-query";
import { formatInstantWords } from "@/lib/dates/words";

type Row = { id: string; toAddress: string; subject: string; status: string; attempts: number; lastError: string | null; createdAt: string; sentAt: string | null };

const STATUS_WORDS: Record<string, string> = { pending: "Waiting", sending: "Sending", sent: "Delivered to provider", failed: "Refused by provider" };

export function OutboxTable({ slug, initial, timeZone }: { slug: string; initial: Row[]; timeZone: string }) {
  const { data } = useQuery({
    queryKey: ["outbox", slug],
    queryFn: async () => {
      const res = await fetch(`/api/clubs/${slug}/outbox`, { cache: "no-store" });
      if (!res.ok) throw new Error(`Outbox ${res.status}`);
      return ((await res.json()) as { messages: Row[] }).messages;
    },
    initialData: initial,
    refetchInterval: 5000,
  });
  return (
    <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Outbox")}>
      <table className="w-full min-w-[40rem] text-left text-sm">
        <thead className="bg-sand-200"><tr><th className="px-3 py-2">Queued</th><th className="px-3 py-2">To</th><th className="px-3 py-2">Subject</th><th className="px-3 py-2">State</th><th className="px-3 py-2">Tries</th></tr></thead>
        <tbody>
          {data.map((m) => (
            <tr key={m.id} className="border-t border-sand-200 align-top">
              <td className="px-3 py-2 font-mono tabular">{formatInstantWords(m.createdAt, timeZone)}</td>
              <td className="break-all px-3 py-2">{m.toAddress}</td>
              <td className="px-3 py-2">{m.subject}</td>
              <td className="px-3 py-2">{STATUS_WORDS[m.status] ?? m.status}{m.lastError ? <span className="block text-xs text-stop-800">{m.lastError}</span> : null}</td>
              <td className="px-3 py-2 tabular">{m.attempts}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
