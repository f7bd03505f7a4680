import type { Metadata } from "next";
import { ClubLocaleForm } from "@/components/clubs/club-locale-form";
import { FlyingDayForm } from "@/components/clubs/flying-day-form";
import { HomePositionForm } from "@/components/clubs/home-position-form";
import { formatDate } from "@/lib/dates";
import { formatMoney } from "@/lib/money/format";
import { CLUB_LOCALES, paperSizeFor } from "@/lib/money/locale";
import { PageHeader } from "@/components/ui/page-header";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Club settings" };

export default async function ClubSettingsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { club } = await authorizePage(slug, ["update", "ClubSettings"]);
  const lat = club.settings.homeLatitude ?? null;
  const lon = club.settings.homeLongitude ?? null;
  return (
    <div className="max-w-3xl">
      <PageHeader title="Club settings" lead="Settings that the club's rules use." />
      <section className="card" aria-labelledby="home-h">
        <h2 id="home-h" className="mb-2 text-lg font-bold">Home field position</h2>
        <p className="mb-3 text-sm text-ink-700">
          Sunrise and sunset here decide when a booking touches night: from one hour after sunset to one hour before sunrise (14 CFR 61.57(b)), when
          passengers need night currency. {lat === null || lon === null ? <strong>Missing record: without it night is unknown, so every booking with passengers is checked as if it touched night.</strong> : `Recorded: ${lat}, ${lon}.`}
        </p>
        <HomePositionForm slug={club.slug} latitude={lat} longitude={lon} />
      </section>
      <section className="card mt-4" aria-labelledby="flying-day-h">
        <h2 id="flying-day-h" className="mb-2 text-lg font-bold">Flying day</h2>
        <p className="mb-3 text-sm text-ink-700">
          The hours the club flies, on the club&apos;s clock ({club.timeZone}): the booking page shows each aircraft&apos;s day inside them, with night marked, and
          lists the free time in words. Now from {club.settings.flyingDayOpens} to {club.settings.flyingDayCloses}.
        </p>
        <FlyingDayForm slug={club.slug} opens={club.settings.flyingDayOpens} closes={club.settings.flyingDayCloses} />
      </section>
      <section className="card mt-4" aria-labelledby="locale-h">
        <h2 id="locale-h" className="mb-2 text-lg font-bold">Locale</h2>
        <p className="mb-3 text-sm text-ink-700">
          How the club writes money, numbers and dates: now {formatMoney(289306, club.currency, club.locale)} and {formatDate("2026-12-01", club.locale)}. Statements print on{" "}
          {paperSizeFor(club.locale) === "LETTER" ? "US Letter" : "A4"} paper.
        </p>
        <ClubLocaleForm
          slug={club.slug}
          locale={club.locale}
          options={CLUB_LOCALES.map((l) => ({ tag: l.tag, name: l.name, sample: `${formatMoney(289306, club.currency, l.tag)} · ${formatDate("2026-12-01", l.tag)}` }))}
        />
      </section>
    </div>
  );
}
