import { scrollArea } from "@/components/ui/scroll-area";
import type { CompletionHistoryRow, UploadLink } from "@/db/queries/fleet";
import { formatHours } from "@/lib/airworthiness";
import type { DueSummary } from "@/lib/fleet/types";
import { lateText, meterWord } from "./due-text";
import { Day } from "@/components/ui/day";

/** `due` flags the governing completion of an item done after it fell due (14 CFR 91.409(b)). */
export function CompletionHistory({ slug, rows, files, due = [], locale }: { slug: string; rows: CompletionHistoryRow[]; files: UploadLink[]; due?: DueSummary[]; locale?: string }) {
  const lateFor = (c: CompletionHistoryRow) => due.find((d) => d.late && d.lastDoneOn === c.doneOn && d.lastDoneHours === c.hours && d.name === c.itemName)?.late ?? null;
  if (rows.length === 0) return <p className="text-ink-700">No completions recorded yet.</p>;
  return (
    <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Inspection history")}>
      <table className="w-full min-w-[40rem] text-left text-sm">
        <thead className="bg-sand-200">
          <tr><th className="px-3 py-2">Done</th><th className="px-3 py-2">Item</th><th className="px-3 py-2">Mechanic</th><th className="px-3 py-2">Notes and files</th></tr>
        </thead>
        <tbody>
          {rows.map((c) => (
            <tr key={c.id} className="border-t border-sand-200 align-top">
              <td className="px-3 py-2 tabular"><Day date={c.doneOn} locale={locale} />{c.hours !== null ? ` · ${formatHours(c.hours)} h${c.meter ? ` ${meterWord(c.meter)}` : ""}` : ""}{c.expiresOn ? ` · expires ${c.expiresOn}` : ""}
                {(() => { const late = lateFor(c); return late ? <span className="block font-sans text-xs font-bold text-stop-800">Late: {lateText(late)}</span> : null; })()}
              </td>
              <td className="px-3 py-2">{c.itemName}</td>
              <td className="px-3 py-2">{c.mechanicName}<span className="block text-xs text-ink-500">{c.mechanicCertificate}</span></td>
              <td className="px-3 py-2">
                {c.notes ?? ""}
                {files.filter((f) => f.subjectId === c.id).map((f) => (
                  <a key={f.id} className="block" href={`/api/clubs/${slug}/uploads/${f.id}`} target="_blank" rel="noreferrer">{f.originalName}</a>
                ))}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
