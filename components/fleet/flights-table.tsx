import { scrollArea } from "@/components/ui/scroll-area";
import type { FlightListRow } from "@/db/queries/fleet-flights";
import { formatHours } from "@/lib/airworthiness";
import { Day } from "@/components/ui/day";

const FLAG = { ok: "Continuous", gap: "Gap", overlap: "Overlap" } as const;

/** The meter log. A flagged flight says so in words, with what was found when reviewed. */
export function FlightsTable({ rows, showAircraft = true, locale }: { rows: FlightListRow[]; showAircraft?: boolean; locale?: string }) {
  if (rows.length === 0) return <p className="text-ink-700">No flights logged yet.</p>;
  return (
    <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Flights")}>
      <table className="w-full min-w-[48rem] text-left text-sm">
        <thead className="bg-sand-200">
          <tr>
            <th className="px-3 py-2">Date</th>
            {showAircraft ? <th className="px-3 py-2">Aircraft</th> : null}
            <th className="px-3 py-2">Pilot</th>
            <th className="px-3 py-2">Hobbs</th>
            <th className="px-3 py-2">Tach</th>
            <th className="px-3 py-2">Landings</th>
            <th className="px-3 py-2">Fuel / oil</th>
            <th className="px-3 py-2">Meters</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((f) => (
            <tr key={f.id} className="border-t border-sand-200 align-top" data-continuity={f.continuity}>
              <td className="px-3 py-2 tabular"><Day date={f.flownOn} locale={locale} /></td>
              {showAircraft ? <td className="px-3 py-2 font-bold">{f.registration}</td> : null}
              <td className="px-3 py-2">{f.pilotName ?? "—"}</td>
              <td className="px-3 py-2 font-mono tabular">{formatHours(f.hobbsOut)}–{formatHours(f.hobbsIn)}</td>
              <td className="px-3 py-2 font-mono tabular">{formatHours(f.tachOut)}–{formatHours(f.tachIn)}</td>
              <td className="px-3 py-2 tabular">{f.dayLandings} day{f.nightFullStopLandings ? `, ${f.nightFullStopLandings} night` : ""}</td>
              <td className="px-3 py-2 tabular">{f.fuelAdded} {f.fuelUnit} / {f.oilAdded} {f.oilUnit}</td>
              <td className={`px-3 py-2 ${f.continuity === "ok" ? "" : "font-bold text-stop-800"}`}>
                {f.continuity === "ok" ? FLAG.ok : `⚑ ${FLAG[f.continuity]}`}
                {f.continuityText ? <span className="block font-normal text-ink-700">{f.continuityText}</span> : null}
                {f.continuity !== "ok" ? (
                  <span className="block font-normal text-ink-500">{f.continuityReviewedAt ? `Reviewed: ${f.continuityReviewNote}` : "Not yet reviewed by maintenance"}</span>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
