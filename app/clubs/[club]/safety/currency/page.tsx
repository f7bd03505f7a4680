import type { Metadata } from "next";
import { Suspense } from "react";
import { CurrencyBoard } from "@/components/currency/currency-board";
import { SendRemindersForm } from "@/components/currency/send-reminders-form";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { getCurrencyBoard } from "@/db/queries/currency";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Currency board" };

export default async function CurrencyBoardPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "CurrencyBoard"]);
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  // Medicals appear as their expiry date only; class, exam and limitations never leave the member's own page.
  const rows = getCurrencyBoard(db, club, today).map((r) => ({ userId: r.userId, name: r.name ?? r.email, email: r.email, items: r.currency.items, next: r.currency.next, attention: r.currency.attention }));
  return (
    <div className="max-w-7xl">
      <PageHeader
        title="Currency board"
        lead={`Every member's currency on ${today}, from the flight log and the flights members add from elsewhere. Club recency rule: flown the type group within ${club.settings.recencyDaysInType} days.`}
      />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      <p className="mb-4 text-sm text-ink-700">
        Passenger currency follows 14 CFR 61.57(a),(b): three takeoffs and landings in the preceding 90 days, counting the day of the landings as day 1 (full stop at night for night). Flight review: 14 CFR 61.56(c). Medical: 14 CFR 61.23(d). Each pilot stays responsible for their own currency.
      </p>
      <Suspense fallback={<div className="h-40 animate-pulse rounded bg-sand-200" />}>
        <CurrencyBoard rows={rows} />
      </Suspense>
      <section className="card mt-6" aria-labelledby="reminders-h">
        <h2 id="reminders-h" className="mb-2 text-lg font-bold">Expiry reminders</h2>
        <SendRemindersForm slug={club.slug} days={club.settings.documentReminderDays} />
      </section>
    </div>
  );
}
