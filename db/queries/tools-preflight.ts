import "server-only";
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { getWeightBalanceProfile } from "@/db/queries/tools-wb";
import { preflightRecordItems, preflightRecords, preflightTemplateItems, preflightTemplates, type PreflightRecord, type PreflightTank, type PreflightRecordItem, type PreflightTemplate, type PreflightTemplateItem } from "@/db/schema";

// The club's preflight checklists (one per aircraft) and the records members make with them.

type Handle = Db | Tx;

export type TemplateWithItems = PreflightTemplate & { items: PreflightTemplateItem[] };

export function getPreflightTemplate(db: Handle, clubId: string, aircraftId: string): TemplateWithItems | undefined {
  const template = db.select().from(preflightTemplates).where(and(eq(preflightTemplates.clubId, clubId), eq(preflightTemplates.aircraftId, aircraftId))).get();
  if (!template) return undefined;
  const items = db
    .select()
    .from(preflightTemplateItems)
    .where(and(eq(preflightTemplateItems.clubId, clubId), eq(preflightTemplateItems.templateId, template.id), isNull(preflightTemplateItems.retiredAt)))
    .orderBy(asc(preflightTemplateItems.position))
    .all();
  return { ...template, items };
}

export type TemplateValues = {
  oilMinimum: number;
  oilMaximum: number | null;
  sumpPoints: string[];
  fuelTanks: PreflightTank[];
  items: { section: string; label: string; kind: "check" | "document" }[];
  updatedById: string;
};

/**
 * Replaces the aircraft's checklist. Items whose section, label and kind stay the same keep
 * their id; the others are retired, not deleted, so earlier records still point at them.
 */
export function savePreflightTemplate(tx: Tx, clubId: string, aircraftId: string, values: TemplateValues): string {
  const current = getPreflightTemplate(tx, clubId, aircraftId);
  const header = { oilMinimum: values.oilMinimum, oilMaximum: values.oilMaximum, sumpPoints: values.sumpPoints, fuelTanks: values.fuelTanks, updatedById: values.updatedById };
  let templateId: string;
  if (current) {
    templateId = current.id;
    tx.update(preflightTemplates).set(header).where(and(eq(preflightTemplates.clubId, clubId), eq(preflightTemplates.id, templateId))).run();
  } else {
    const [row] = tx.insert(preflightTemplates).values({ ...header, clubId, aircraftId }).returning({ id: preflightTemplates.id }).all();
    templateId = row!.id;
  }
  const sig = (i: { section: string; label: string; kind: string }) => `${i.kind}\u0000${i.section}\u0000${i.label}`;
  const keep = new Map((current?.items ?? []).map((i) => [sig(i), i]));
  const now = new Date();
  const wanted = new Set(values.items.map(sig));
  for (const old of current?.items ?? []) {
    if (!wanted.has(sig(old))) tx.update(preflightTemplateItems).set({ retiredAt: now }).where(and(eq(preflightTemplateItems.clubId, clubId), eq(preflightTemplateItems.id, old.id))).run();
  }
  values.items.forEach((item, position) => {
    const same = keep.get(sig(item));
    if (same) tx.update(preflightTemplateItems).set({ position }).where(and(eq(preflightTemplateItems.clubId, clubId), eq(preflightTemplateItems.id, same.id))).run();
    else tx.insert(preflightTemplateItems).values({ clubId, templateId, ...item, position }).run();
  });
  return templateId;
}

export type RecordWithItems = PreflightRecord & { items: PreflightRecordItem[] };

export function listPreflightRecords(db: Handle, clubId: string, bookingId: string): PreflightRecord[] {
  return db.select().from(preflightRecords).where(and(eq(preflightRecords.clubId, clubId), eq(preflightRecords.bookingId, bookingId))).orderBy(desc(preflightRecords.createdAt)).all();
}

export function getPreflightRecord(db: Handle, clubId: string, recordId: string): RecordWithItems | undefined {
  const record = db.select().from(preflightRecords).where(and(eq(preflightRecords.clubId, clubId), eq(preflightRecords.id, recordId))).get();
  if (!record) return undefined;
  const items = db.select().from(preflightRecordItems).where(and(eq(preflightRecordItems.clubId, clubId), eq(preflightRecordItems.recordId, record.id))).orderBy(sql`rowid`).all();
  return { ...record, items };
}

/**
 * The tanks a preflight reads: the template's own (name + usable capacity), else the weight
 * and balance profile's, else one "Fuel on board" reading with no capacity to check against.
 */
export function preflightTanks(db: Handle, clubId: string, template: Pick<PreflightTemplate, "aircraftId" | "fuelTanks"> | undefined, aircraftId: string): { name: string; capacity: number | null }[] {
  if (template?.fuelTanks.length) return template.fuelTanks.map((t) => ({ name: t.name, capacity: t.capacity }));
  const profile = getWeightBalanceProfile(db, clubId, aircraftId);
  return profile?.tanks.map((t) => ({ name: t.name, capacity: t.usableCapacity })) ?? [{ name: "Fuel on board", capacity: null }];
}
