// Quick choices for the reports' period picker, from the club's today. Pure date arithmetic.
import { addDays, endOfMonthAfter } from "@/lib/dates";

export type NamedPeriod = { label: string; from: string; to: string };

export function reportPresets(today: string): NamedPeriod[] {
  const monthStart = `${today.slice(0, 7)}-01`;
  const lastMonthEnd = addDays(monthStart, -1);
  const year = Number(today.slice(0, 4));
  return [
    { label: "This month", from: monthStart, to: today },
    { label: "Last month", from: `${lastMonthEnd.slice(0, 7)}-01`, to: lastMonthEnd },
    { label: "Year to date", from: `${year}-01-01`, to: today },
    { label: "Last year", from: `${year - 1}-01-01`, to: `${year - 1}-12-31` },
    { label: "Last full quarter", ...lastQuarter(today) },
  ];
}

function lastQuarter(today: string): { from: string; to: string } {
  const year = Number(today.slice(0, 4));
  const q = Math.floor((Number(today.slice(5, 7)) - 1) / 3);
  const [y, startMonth] = q === 0 ? [year - 1, 10] : [year, (q - 1) * 3 + 1];
  const from = `${y}-${String(startMonth).padStart(2, "0")}-01`;
  return { from, to: endOfMonthAfter(from, 2) };
}
