import type { Metadata } from "next";
import { Suspense } from "react";
import { CurrencyBoard } from "@/components/currency/currency-board";
import { SendRemindersForm } from "@/components/currency/send-reminders-form";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { VerifyClaimForm } from "@/components/currency/verify-claim-form";
import { getCurrencyBoard, listClaims } from "@/db/queries/currency";
import { can } from "@/permissions";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Currency board" };

export default async function CurrencyBoardPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "CurrencyBoard"]);
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  // Medicals appear as their expiry date only; class, exam and limitations never leave the member's own page.
  const board = getCurrencyBoard(db, club, today);
  const rows = board.map((r) => ({ userId: r.userId, name: r.name ?? r.email, email: r.email, items: r.currency.items, next: r.currency.next, attention: r.currency.attention }));
  const mayVerify = can(ability, "verify", "Currency");
  const names = new Map(board.map((r) => [r.userId, r.name ?? r.email]));
  // Claims of members still on the board; a verifier never sees their own claims here.
  const claims = listClaims(db, club.id).filter((c) => names.has(c.userId));
  return (
    <div className="max-w-7xl">
      <PageHeader
        title="Currency board"
        lead={`Every member's currency on ${today}, from the flight log and the flights members add from elsewhere. Club recency rule: flown the type group within ${club.settings.recencyDaysInType} days.`}
      />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      <p className="mb-4 text-sm text-ink-700">
        Passenger currency follows 14 CFR 61.57(a),(b): three takeoffs and landings in the preceding 90 days in the same category and class, counting the day of the landings as day 1 (full stop at night for night; full stop in a tailwheel airplane for a tailwheel airplane). Flight review: 14 CFR 61.56(c). Medical: 14 CFR 61.23(d). Each pilot stays responsible for their own currency.
      </p>
      <p className="mb-4 text-sm text-ink-700">
        ✓ Counted: the club&apos;s flight log and records an instructor or the safety officer verified. ◇ Claimed: what a member entered about themselves; shown beside, never counted by the booking checks until verified.
      </p>
      <Suspense fallback={<div className="h-40 animate-pulse rounded bg-sand-200" />}>
        <CurrencyBoard rows={rows} />
      </Suspense>
      <section className="card mt-6" aria-labelledby="claims-h">
        <h2 id="claims-h" className="mb-2 text-lg font-bold">Claims waiting for verification</h2>
        {claims.length === 0 ? <p className="text-sm text-ink-500">No claims waiting.</p> : null}
        <ul className="divide-y divide-sand-200">
          {claims.map((c) => (
            <li key={c.id} className="py-3">
              <p className="mb-2"><span className="font-bold">{names.get(c.userId)}</span> · ◇ {c.what}{c.uploadId ? <> · <a href={`/api/clubs/${club.slug}/uploads/${c.uploadId}`} target="_blank" rel="noopener">Open the member&apos;s file</a></> : null}</p>
              {mayVerify && c.userId !== user.id ? (
                <details>
                  <summary className="cursor-pointer font-bold text-fin-600">Verify</summary>
                  <div className="mt-2"><VerifyClaimForm slug={club.slug} kind={c.kind} recordId={c.id} hasFile={Boolean(c.uploadId)} label={`${names.get(c.userId)}: ${c.what}`} /></div>
                </details>
              ) : mayVerify ? <p className="text-sm text-ink-500">Your own record: another instructor or the safety officer verifies it.</p> : <p className="text-sm text-ink-500">Instructors and the safety officer verify claims.</p>}
            </li>
          ))}
        </ul>
      </section>
      <section className="card mt-6" aria-labelledby="reminders-h">
        <h2 id="reminders-h" className="mb-2 text-lg font-bold">Expiry reminders</h2>
        <SendRemindersForm slug={club.slug} days={club.settings.documentReminderDays} />
      </section>
    </div>
  );
}
