import { compareIsoDates, type IsoDate } from "@/lib/dates";

export type DeadlineState = "none" | "open" | "due_today" | "overdue";

/** Where an acknowledgement deadline stands on the club's calendar date `today`. */
export function deadlineState(acknowledgeBy: IsoDate | null, today: IsoDate): DeadlineState {
  if (!acknowledgeBy) return "none";
  const c = compareIsoDates(today, acknowledgeBy);
  return c < 0 ? "open" : c === 0 ? "due_today" : "overdue";
}

export type AckRow = { userId: string; name: string | null; email: string; acknowledgedAt: Date | null };

export type AckStats = {
  audience: number;
  acknowledged: number;
  outstanding: number;
  /** Share acknowledged, whole percent rounded down (so 99.6 % never shows as "100 %"). */
  percent: number;
  rows: AckRow[];
};

/**
 * Who of the audience has and has not acknowledged. Acknowledgements from people no longer in
 * the audience (left the club, checkout revoked) are not counted, so the numbers always add up.
 * Outstanding people come first, then by name.
 */
export function acknowledgementStats(
  audience: readonly { userId: string; name: string | null; email: string }[],
  acks: readonly { userId: string; acknowledgedAt: Date }[],
): AckStats {
  const byUser = new Map(acks.map((a) => [a.userId, a.acknowledgedAt]));
  const rows: AckRow[] = audience.map((p) => ({ userId: p.userId, name: p.name, email: p.email, acknowledgedAt: byUser.get(p.userId) ?? null }));
  rows.sort((a, b) => {
    if ((a.acknowledgedAt === null) !== (b.acknowledgedAt === null)) return a.acknowledgedAt === null ? -1 : 1;
    return (a.name ?? a.email).localeCompare(b.name ?? b.email);
  });
  const acknowledged = rows.filter((r) => r.acknowledgedAt !== null).length;
  return {
    audience: rows.length,
    acknowledged,
    outstanding: rows.length - acknowledged,
    percent: rows.length === 0 ? 0 : Math.floor((acknowledged * 100) / rows.length),
    rows,
  };
}
