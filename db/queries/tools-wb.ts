import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { bookingLoadings, weightBalanceProfiles, type BookingLoading, type WeightBalanceProfile } from "@/db/schema";
import type { LoadingProfile } from "@/lib/bookings/loading";

// Weight and balance profiles (one per aircraft) and the loading saved with a booking.

type Handle = Db | Tx;

export function getWeightBalanceProfile(db: Handle, clubId: string, aircraftId: string): WeightBalanceProfile | undefined {
  return db.select().from(weightBalanceProfiles).where(and(eq(weightBalanceProfiles.clubId, clubId), eq(weightBalanceProfiles.aircraftId, aircraftId))).get();
}

export function listWeightBalanceProfiles(db: Handle, clubId: string): WeightBalanceProfile[] {
  return db.select().from(weightBalanceProfiles).where(eq(weightBalanceProfiles.clubId, clubId)).all();
}

export function toLoadingProfile(p: WeightBalanceProfile): LoadingProfile {
  return {
    unitSystem: p.unitSystem,
    emptyWeight: p.emptyWeight,
    emptyArm: p.emptyArm,
    maxTakeoffWeight: p.maxTakeoffWeight,
    maxLandingWeight: p.maxLandingWeight,
    stations: p.stations,
    tanks: p.tanks,
    fuelKind: p.fuelKind,
    envelopeNormal: p.envelopeNormal,
    envelopeUtility: p.envelopeUtility ?? null,
  };
}

export type ProfileValues = Omit<typeof weightBalanceProfiles.$inferInsert, "id" | "clubId" | "aircraftId" | "createdAt" | "updatedAt">;

/** Writes the aircraft's profile, replacing the one it had; returns the profile id. */
export function saveWeightBalanceProfile(tx: Tx, clubId: string, aircraftId: string, values: ProfileValues): string {
  const existing = getWeightBalanceProfile(tx, clubId, aircraftId);
  if (existing) {
    tx.update(weightBalanceProfiles).set(values).where(and(eq(weightBalanceProfiles.clubId, clubId), eq(weightBalanceProfiles.id, existing.id))).run();
    return existing.id;
  }
  const [row] = tx.insert(weightBalanceProfiles).values({ ...values, clubId, aircraftId }).returning({ id: weightBalanceProfiles.id }).all();
  return row!.id;
}

export function getBookingLoading(db: Handle, clubId: string, bookingId: string): BookingLoading | undefined {
  return db.select().from(bookingLoadings).where(and(eq(bookingLoadings.clubId, clubId), eq(bookingLoadings.bookingId, bookingId))).get();
}

export type LoadingValues = Omit<typeof bookingLoadings.$inferInsert, "id" | "clubId" | "bookingId" | "createdAt" | "updatedAt">;

export function saveBookingLoading(tx: Tx, clubId: string, bookingId: string, values: LoadingValues): string {
  const existing = getBookingLoading(tx, clubId, bookingId);
  if (existing) {
    tx.update(bookingLoadings).set(values).where(and(eq(bookingLoadings.clubId, clubId), eq(bookingLoadings.id, existing.id))).run();
    return existing.id;
  }
  const [row] = tx.insert(bookingLoadings).values({ ...values, clubId, bookingId }).returning({ id: bookingLoadings.id }).all();
  return row!.id;
}
