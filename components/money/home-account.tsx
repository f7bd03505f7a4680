import Link from "next/link";
import type { Db } from "@/db/client";
import type { Club } from "@/db/schema";
import { memberArrears } from "@/db/queries/money-arrears";
import { ArrearsFlag, Money, balanceWords } from "./money-text";

/** The club home's "Your account" tile: balance, standing and the way to pay. */
export function HomeAccount({ db, club, userId, today }: { db: Db; club: Club; userId: string; today: string }) {
  const status = memberArrears(db, club.id, userId, today);
  return (
    <article className="card">
      <h2 className="text-lg font-bold"><Link href={`/clubs/${club.slug}/account`}>Your account</Link></h2>
      <p className="mt-1 text-2xl font-bold"><Money minor={status.balanceMinor} currency={club.currency} locale={club.locale} credit /></p>
      <p className="text-ink-700">{balanceWords(status.balanceMinor)}</p>
      <p className="mt-2"><ArrearsFlag inArrears={status.inArrears} /></p>
      <p className="mt-2 text-sm"><Link href={`/clubs/${club.slug}/account`}>{status.balanceMinor > 0 ? "Statements and pay by card" : "Statements and activity"}</Link></p>
    </article>
  );
}
