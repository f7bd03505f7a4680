import Link from "next/link";
import type { Club } from "@/db/schema";
import type { Db } from "@/db/client";
import { getMemberCurrency } from "@/db/queries/currency";
import { CurrencyStateBadge } from "./state-badge";

/** Home page tile: the member's own currency at a glance, and what ends next. */
export function HomeCurrency({ db, club, userId, today }: { db: Db; club: Club; userId: string; today: string }) {
  const { items, next, attention } = getMemberCurrency(db, club, userId, today);
  const core = items.filter((i) => !i.key.startsWith("recency:")).concat(items.filter((i) => i.key.startsWith("recency:")).slice(0, 2));
  return (
    <article className="card" aria-labelledby="home-currency-h">
      <h2 id="home-currency-h" className="text-lg font-bold"><Link href={`/clubs/${club.slug}/me`}>Your currency</Link></h2>
      <p className="mt-1 text-sm text-ink-700">{attention === 0 ? "Everything on record is current." : `${attention} ${attention === 1 ? "item needs" : "items need"} attention.`}{next ? ` Next to end: ${next.label}, after ${next.lastDay}.` : ""}</p>
      <ul className="mt-2 flex flex-col gap-1 text-sm">
        {core.map((i) => (
          <li key={i.key} className="flex flex-wrap items-center justify-between gap-2"><span>{i.label}</span><CurrencyStateBadge state={i.state} /></li>
        ))}
      </ul>
    </article>
  );
}
