import { scrollArea } from "@/components/ui/scroll-area";
import { formatHours } from "@/lib/airworthiness";
import type { DueSummary } from "@/lib/fleet/types";
import { dueLabel, dueText, dueTone, lateText, meterWord } from "./due-text";

/** Every applicable item with its last completion and when it comes due; scrolls inside its box on a phone. */
export function DueTable({ due, caption }: { due: DueSummary[]; caption: string }) {
  return (
    <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Due items")}>
      <table className="w-full min-w-[40rem] text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-sand-200">
          <tr>
            <th className="px-3 py-2">Item</th>
            <th className="px-3 py-2">Last done</th>
            <th className="px-3 py-2">Comes due</th>
            <th className="px-3 py-2">State</th>
          </tr>
        </thead>
        <tbody>
          {due.map((d) => (
            <tr key={d.key} className="border-t border-sand-200 align-top">
              <td className="px-3 py-2">
                <span className="font-bold">{d.name}</span>
                {d.source ? <span className="block text-xs text-ink-500">{d.source}{d.ifrOnly ? " · IFR only" : ""}</span> : null}
              </td>
              <td className="px-3 py-2 font-mono tabular">
                {d.lastDoneOn ?? "—"}{d.lastDoneHours !== null && d.lastDoneHours !== undefined ? ` at ${formatHours(d.lastDoneHours)} h${d.lastDoneMeter ? ` ${meterWord(d.lastDoneMeter)}` : ""}` : ""}
                {d.late ? <span className="block font-sans text-xs font-bold text-stop-800">Late: {lateText(d.late)}</span> : null}
              </td>
              <td className="px-3 py-2">{dueText(d)}</td>
              <td className={`px-3 py-2 ${dueTone(d)}`}>{dueLabel(d) ?? "Current"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
