"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useRef } from "react";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { STATUS_WORDS } from "@/lib/fleet/status-words";
import { STATUS_TEXT_TONE, StatusShape } from "@/components/ui/status-badge";
import { AircraftCard } from "./aircraft-card";

export type FlightLineData = { today: string; generatedAt: string; timeZone: string; entries: FlightLineEntry[] };

const REFRESH_MS = 30_000;

function clock(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", second: "2-digit", hourCycle: "h23" }).format(new Date(iso));
}

/** The flight line, kept live from the JSON route; the server-rendered data shows first. */
export function FlightLineBoard({ slug, initial, blockLines = {} }: { slug: string; initial: FlightLineData; /** Maintenance blocks today, in words, by aircraft id. */ blockLines?: Record<string, string[]> }) {
  // The tag of the flight line on screen: while it is still current the server answers 304 with
  // no body, and the records shown are confirmed as of that answer.
  const held = useRef<{ etag: string; data: FlightLineData } | null>(null);
  const queryClient = useQueryClient();
  const queryKey = ["flight-line", slug];
  const { data: cached, isError, isFetching } = useQuery({
    queryKey,
    queryFn: async (): Promise<FlightLineData> => {
      const kept = held.current;
      const res = await fetch(`/api/clubs/${slug}/flight-line`, { cache: "no-store", headers: kept ? { "If-None-Match": kept.etag } : {} });
      if (res.status === 304 && kept) return { ...kept.data, generatedAt: new Date().toISOString() };
      if (!res.ok) throw new Error(`Flight line ${res.status}`);
      const fresh = (await res.json()) as FlightLineData;
      const etag = res.headers.get("etag");
      held.current = etag ? { etag, data: fresh } : null;
      return fresh;
    },
    initialData: initial,
    // The server's copy is as old as it says, so a newer one is never held back as "fresh".
    initialDataUpdatedAt: Date.parse(initial.generatedAt),
    refetchInterval: REFRESH_MS,
    refetchOnWindowFocus: true,
  });
  // initialData only seeds an empty cache: after a change (a grounding notice, a squawk) the page
  // is rendered again with newer records, while the cache kept from an earlier visit still holds
  // the old ones until its next refetch. The newer of the two is shown, and put in the cache.
  const serverIsNewer = Date.parse(initial.generatedAt) > Date.parse(cached.generatedAt);
  const data = serverIsNewer ? initial : cached;
  useEffect(() => {
    if (serverIsNewer) queryClient.setQueryData(["flight-line", slug], initial, { updatedAt: Date.parse(initial.generatedAt) });
  }, [serverIsNewer, initial, queryClient, slug]);
  const counts = data.entries.reduce<Record<string, number>>((acc, e) => ({ ...acc, [e.status]: (acc[e.status] ?? 0) + 1 }), {});
  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-2 text-sm">
        <ul className="flex flex-wrap gap-3" aria-label="Fleet summary">
          {(["grounded", "unknown", "limited", "flyable"] as const).filter((s) => counts[s]).map((s) => (
            <li key={s} className={`inline-flex items-center gap-1 font-bold ${STATUS_TEXT_TONE[s]}`}><StatusShape status={s} size={14} /> {counts[s]} {STATUS_WORDS[s].toLowerCase()}</li>
          ))}
        </ul>
        <p role="status" aria-live="polite" className={isError ? "font-bold text-stop-800" : "text-ink-500"}>
          {isError
            ? `Could not refresh. Showing the records as of ${clock(data.generatedAt, data.timeZone)}; they may be out of date.`
            : `${isFetching ? "Refreshing… " : ""}As of ${clock(data.generatedAt, data.timeZone)} (${data.timeZone}), refreshed every 30 s.`}
        </p>
      </div>
      {data.entries.length === 0 ? <p className="card">No aircraft on the club&apos;s fleet yet.</p> : null}
      <div className="grid gap-4 lg:grid-cols-2">
        {data.entries.map((entry) => (
          <AircraftCard key={entry.aircraft.id} entry={entry} slug={slug} blockLines={blockLines[entry.aircraft.id]} />
        ))}
      </div>
    </div>
  );
}
