"use server";
import { eq } from "drizzle-orm";
import { clubs } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { formatDate } from "@/lib/dates";
import { formatMoney } from "@/lib/money/format";
import { CLUB_LOCALES } from "@/lib/money/locale";
import { writeAudit } from "@/lib/server/audit";
import { clubLocaleSchema } from "@/lib/validation/club-settings";

/** How the club writes money, numbers and dates (and the paper its PDFs use). */
export const updateClubLocale = clubAction({
  schema: clubLocaleSchema,
  permission: ["update", "ClubSettings"],
  success: "Locale saved.",
  run(tx, { club, user }, input) {
    const before = { locale: club.locale };
    tx.update(clubs).set({ locale: input.locale, updatedAt: new Date() }).where(eq(clubs.id, club.id)).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "club.settings.update", subjectType: "Club", subjectId: club.id, before, after: { locale: input.locale } });
    const name = CLUB_LOCALES.find((l) => l.tag === input.locale)?.name ?? input.locale;
    return {
      message: `Locale saved: ${name}. Amounts now read ${formatMoney(289306, club.currency, input.locale)} and dates ${formatDate("2026-12-01", input.locale)}.`,
      refresh: true,
    };
  },
});
