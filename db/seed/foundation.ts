import { defaultLocaleFor } from "@/lib/money/locale";
import type { Db } from "@/db/client";
import { clubs, memberships, operatorAssignments, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { defaultClubSettings } from "@/lib/validation/club-settings";
import { DEMO_CLUBS, DEMO_PASSWORD, DEMO_PEOPLE } from "./scenario";

export type SeededFoundation = { clubIds: Record<string, string>; userIds: Record<string, string> };

export async function seedFoundation(db: Db, opts: { joinedOn?: string } = {}): Promise<SeededFoundation> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const joinedOn = opts.joinedOn ?? "2024-03-01";
  return db.transaction((tx) => {
    const clubIds: Record<string, string> = {};
    for (const c of DEMO_CLUBS) {
      const settings = defaultClubSettings({ ...(c.key === "reedwater" ? { recencyDaysInType: 60 } : {}), homeLatitude: c.home.latitude, homeLongitude: c.home.longitude });
      const [row] = tx.insert(clubs).values({ slug: c.slug, name: c.name, timeZone: c.timeZone, currency: c.currency, locale: defaultLocaleFor(c.currency, c.timeZone), unitSystem: c.unitSystem, settings }).returning({ id: clubs.id }).all();
      clubIds[c.key] = row!.id;
    }
    const userIds: Record<string, string> = {};
    for (const p of DEMO_PEOPLE) {
      const [u] = tx
        .insert(users)
        .values({ email: p.email, name: p.name, passwordHash, emailVerified: new Date(), platformRole: p.operator ? "operator" : null })
        .returning({ id: users.id })
        .all();
      userIds[p.email] = u!.id;
      for (const [clubKey, roles] of Object.entries(p.clubs)) {
        if (!roles) continue;
        tx.insert(memberships).values({ clubId: clubIds[clubKey]!, userId: u!.id, roles, joinedOn }).run();
      }
      if (p.operator) for (const id of Object.values(clubIds)) tx.insert(operatorAssignments).values({ userId: u!.id, clubId: id }).run();
    }
    return { clubIds, userIds };
  });
}
