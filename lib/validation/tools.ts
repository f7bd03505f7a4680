import { z } from "zod";
import { checkbox, filesField } from "./fleet";
import { recordId } from "./primitives";

// Pilot tools and the preflight record. Lists that a club edits (stations, tanks, envelope
// corners, checklist items) are typed one per line; each line's problem is named by its number.

const id = (what: string) => recordId(`Choose ${what}.`);

/** A typed list (one item per line) is at most this long, whatever its lines say. */
const MAX_LIST_CHARS = 20_000;
const listText = (what: string) => z.string({ error: `Enter ${what}.` }).max(MAX_LIST_CHARS, { error: `Keep ${what} under ${MAX_LIST_CHARS.toLocaleString("en-US")} characters.` });
const blank = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export function decimal(label: string, opts: { min?: number; max: number; allowZero?: boolean }) {
  const min = opts.min ?? 0;
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .min(1, { error: `Enter ${label}.` })
    .refine((v) => v.length <= 32 && /^-?\d+(\.\d+)?$/.test(v), { error: `Enter ${label} as a number, like 12.5.` })
    .transform(Number)
    .refine((v) => v >= min && v <= opts.max, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be between ${min} and ${opts.max}.` })
    .refine((v) => opts.allowZero !== false || v !== 0, { error: `${label[0]!.toUpperCase()}${label.slice(1)} cannot be zero.` });
}

const optionalDecimal = (label: string, max: number) => z.preprocess(blank, decimal(label, { max }).optional()).transform((v) => v ?? null);
const zeroIfBlank = (label: string, max: number) => z.preprocess((v) => (v === undefined || v === "" ? "0" : v), decimal(label, { max }));

function lines(v: unknown): string[] {
  return typeof v === "string" ? v.split(/\r?\n/).map((l) => l.trim()).filter(Boolean) : [];
}

function parseNumbers(line: string, count: number): number[] | null {
  const parts = line.split(/[|,;]/).map((p) => p.trim());
  const nums = parts.slice(-count).map(Number);
  return parts.length >= count && nums.every((n) => Number.isFinite(n)) ? nums : null;
}

function slug(name: string, index: number): string {
  return `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "item"}-${index + 1}`;
}

/** "Front seats | 37 | 400" → a station; the limit may be left off ("Front seats | 37"). */
const stationsField = listText("the stations").transform((v, ctx) => {
  const out: { key: string; name: string; arm: number; maxWeight: number | null }[] = [];
  let bad = false;
  lines(v).forEach((line, i) => {
    const parts = line.split("|").map((p) => p.trim());
    const [name, arm, max] = parts;
    if (!name || arm === undefined || !Number.isFinite(Number(arm)) || (max !== undefined && max !== "" && !(Number(max) > 0))) {
      ctx.addIssue({ code: "custom", message: `Line ${i + 1}: write "name | arm | limit", like "Front seats | 37 | 400" (the limit may be left off).` });
      bad = true;
      return;
    }
    out.push({ key: slug(name, i), name, arm: Number(arm), maxWeight: max === undefined || max === "" ? null : Number(max) });
  });
  if (out.length === 0 && !bad) ctx.addIssue({ code: "custom", message: "Enter at least one station (seats, baggage)." });
  return out;
});

/** "Left wing tank | 48 | 20" → a tank with its arm and usable capacity. */
const tanksField = listText("the fuel tanks").transform((v, ctx) => {
  const out: { key: string; name: string; arm: number; usableCapacity: number }[] = [];
  lines(v).forEach((line, i) => {
    const [name, arm, capacity] = line.split("|").map((p) => p.trim());
    if (!name || !Number.isFinite(Number(arm)) || !(Number(capacity) > 0)) {
      ctx.addIssue({ code: "custom", message: `Line ${i + 1}: write "name | arm | usable capacity", like "Left wing tank | 48 | 20".` });
      return;
    }
    out.push({ key: slug(name, i), name, arm: Number(arm), usableCapacity: Number(capacity) });
  });
  if (out.length === 0) ctx.addIssue({ code: "custom", message: "Enter at least one fuel tank." });
  return out;
});

function envelopeField(required: boolean) {
  return z.preprocess(
    (v) => (v === undefined ? "" : v),
    listText("the envelope").transform((v, ctx) => {
      const corners: [number, number][] = [];
      const all = lines(v);
      if (all.length === 0) {
        if (required) ctx.addIssue({ code: "custom", message: "Enter the envelope's corners, one \"arm, weight\" pair per line." });
        return null;
      }
      all.forEach((line, i) => {
        const nums = parseNumbers(line, 2);
        if (!nums || nums[1]! <= 0) ctx.addIssue({ code: "custom", message: `Line ${i + 1}: write "arm, weight", like "35.0, 1500".` });
        else corners.push([nums[0]!, nums[1]!]);
      });
      if (corners.length < 3) ctx.addIssue({ code: "custom", message: "An envelope needs at least three corners." });
      return corners;
    }),
  );
}

export const weightBalanceProfileSchema = z
  .object({
    aircraftId: id("an aircraft"),
    emptyWeight: decimal("the empty weight", { max: 20_000, allowZero: false }),
    emptyArm: decimal("the empty arm", { min: -10_000, max: 10_000 }),
    maxTakeoffWeight: decimal("the maximum takeoff weight", { max: 20_000, allowZero: false }),
    maxLandingWeight: optionalDecimal("the maximum landing weight", 20_000),
    fuelKind: z.enum(["avgas", "jet"], { error: "Choose the fuel." }),
    burnPerHour: optionalDecimal("the cruise burn", 500),
    stations: stationsField,
    tanks: tanksField,
    envelopeNormal: envelopeField(true),
    envelopeUtility: envelopeField(false),
    source: z.preprocess(blank, z.string().trim().max(300, { error: "Keep the source to 300 characters." }).optional()).transform((v) => v ?? null),
  })
  .superRefine((v, ctx) => {
    if (v.maxTakeoffWeight <= v.emptyWeight) ctx.addIssue({ code: "custom", path: ["maxTakeoffWeight"], message: "The maximum takeoff weight must be more than the empty weight." });
    if (v.maxLandingWeight !== null && v.maxLandingWeight > v.maxTakeoffWeight) ctx.addIssue({ code: "custom", path: ["maxLandingWeight"], message: "The maximum landing weight cannot be more than the maximum takeoff weight." });
  });

const weightList = (label: string, max: number) =>
  z.preprocess((v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]), z.array(zeroIfBlank(label, max)).max(50, { error: "At most 50 entries." }));
const keyList = z.preprocess((v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]), z.array(z.string().trim().min(1).max(80)).max(50, { error: "At most 50 entries." }));

const loadingFields = {
  category: z.enum(["normal", "utility"], { error: "Choose the category." }).default("normal"),
  stationKey: keyList,
  stationWeight: weightList("the weight", 5_000),
  tankKey: keyList,
  tankVolume: weightList("the fuel", 5_000),
  burnVolume: zeroIfBlank("the planned burn", 5_000),
};

function sameLengths(v: { stationKey: string[]; stationWeight: number[]; tankKey: string[]; tankVolume: number[] }, ctx: z.RefinementCtx) {
  if (v.stationKey.length !== v.stationWeight.length) ctx.addIssue({ code: "custom", path: ["stationWeight"], message: "Enter a weight for every station (0 when empty)." });
  if (v.tankKey.length !== v.tankVolume.length) ctx.addIssue({ code: "custom", path: ["tankVolume"], message: "Enter the fuel in every tank (0 when empty)." });
}

export const loadingSchema = z.object({ bookingId: id("a booking"), ...loadingFields }).superRefine(sameLengths);

/** The quick calculator on the tools page: the same inputs for an aircraft, nothing saved. */
export const quickLoadingSchema = z.object({ aircraft: id("an aircraft"), ...loadingFields }).superRefine(sameLengths);

/** The stateless calculators read their inputs from the page's query string. */
export const fuelToolSchema = z.object({
  usableFuel: decimal("the usable fuel", { max: 5_000 }),
  burnPerHour: decimal("the burn per hour", { max: 500, allowZero: false }),
  plannedHours: decimal("the planned flight time", { max: 24 }),
  night: checkbox,
});

export const densityToolSchema = z.object({
  fieldElevation: decimal("the field elevation", { min: -1_500, max: 15_000 }),
  altimeter: decimal("the altimeter setting", { min: 25, max: 32 }),
  oat: decimal("the outside air temperature", { min: -60, max: 60 }),
});

export const densityToolMetricSchema = z.object({
  fieldElevation: decimal("the field elevation", { min: -1_500, max: 15_000 }),
  qnh: decimal("the QNH", { min: 850, max: 1_085 }),
  oat: decimal("the outside air temperature", { min: -60, max: 60 }),
});

/** Checklist lines: "Section: item". Documents are one per line. */
const checklistField = listText("the checklist").transform((v, ctx) => {
  const out: { section: string; label: string }[] = [];
  lines(v).forEach((line, i) => {
    const at = line.indexOf(":");
    const section = at > 0 ? line.slice(0, at).trim() : "";
    const label = at > 0 ? line.slice(at + 1).trim() : "";
    if (!section || !label || label.length > 160 || section.length > 60) ctx.addIssue({ code: "custom", message: `Line ${i + 1}: write "Section: item", like "Left wing: aileron free and correct".` });
    else out.push({ section, label });
  });
  if (out.length === 0) ctx.addIssue({ code: "custom", message: "Enter at least one checklist item." });
  return out;
});

const listField = (what: string, max: number, required?: string) =>
  z.preprocess(
    (v) => (v === undefined ? "" : v),
    listText(`the ${what} list`).transform((v, ctx) => {
      const all = lines(v);
      all.forEach((l, i) => l.length > max && ctx.addIssue({ code: "custom", message: `Line ${i + 1}: keep each ${what} to ${max} characters.` }));
      if (required && all.length === 0) ctx.addIssue({ code: "custom", message: required });
      return all;
    }),
  );

/** Tanks checked before flight: "Name | usable capacity", one per line (empty: the weight-and-balance tanks). */
const fuelTanksField = z.preprocess(
  (v) => (v === undefined ? "" : v),
  listText("the tank list").transform((v, ctx) => {
    const out: { name: string; capacity: number }[] = [];
    lines(v).forEach((line, i) => {
      const [name, capacity, ...rest] = line.split("|").map((p) => p.trim());
      const n = Number(capacity);
      if (!name || name.length > 60 || !capacity || rest.length || !/^\d+(\.\d{1,2})?$/.test(capacity) || n <= 0 || n > 5_000) {
        ctx.addIssue({ code: "custom", message: `Line ${i + 1}: write "Tank name | usable capacity", like "Left wing tank | 20".` });
      } else if (out.some((t) => t.name.toLowerCase() === name.toLowerCase())) {
        ctx.addIssue({ code: "custom", message: `Line ${i + 1}: "${name}" is listed twice; give each tank its own name.` });
      } else out.push({ name, capacity: n });
    });
    if (out.length > 12) ctx.addIssue({ code: "custom", message: "At most 12 tanks." });
    return out;
  }),
);

export const preflightTemplateSchema = z
  .object({
    aircraftId: id("an aircraft"),
    documents: listField("document", 120),
    fuelTanks: fuelTanksField,
    checklist: checklistField,
    sumpPoints: listField("drain point", 80, "Enter at least one fuel drain point."),
    oilMinimum: decimal("the oil minimum", { max: 50, allowZero: false }),
    oilMaximum: optionalDecimal("the oil maximum", 50),
  })
  .superRefine((v, ctx) => {
    if (v.oilMaximum !== null && v.oilMaximum < v.oilMinimum) ctx.addIssue({ code: "custom", path: ["oilMaximum"], message: "The maximum cannot be below the minimum." });
  });

const itemSchema = z
  .object({
    result: z.enum(["ok", "finding"], { error: "Mark this item OK or a finding." }),
    note: z.preprocess(blank, z.string().trim().max(2000, { error: "Keep the finding to 2000 characters." }).optional()).transform((v) => v ?? null),
    grounding: checkbox,
    photos: filesField("photos", 6),
  })
  .superRefine((v, ctx) => {
    // One tap makes a finding; words are welcome but not needed (the squawk names the item).
    if (v.result === "finding" && v.note && v.note.length < 5) ctx.addIssue({ code: "custom", path: ["note"], message: "Say a little more about what you found (at least 5 characters), or leave it empty." });
  });

/** Gathers the per-item fields ("result.<id>", "note.<id>", …) of the record form into `items`. */
function gatherItems(raw: unknown): unknown {
  if (!raw || typeof raw !== "object") return raw;
  const src = raw as Record<string, unknown>;
  const items: Record<string, Record<string, unknown>> = {};
  const sumps: Record<string, unknown> = {};
  const rest: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(src)) {
    const m = /^(result|note|grounding|photos)\.(.+)$/.exec(k);
    const s = /^sump\.(\d+)$/.exec(k);
    if (m) (items[m[2]!] ??= {})[m[1]!] = v;
    else if (s) sumps[s[1]!] = v;
    else rest[k] = v;
  }
  const points = Array.isArray(src.sumpPoint) ? src.sumpPoint : src.sumpPoint === undefined ? [] : [src.sumpPoint];
  return { ...rest, items, sumps: points.map((point, i) => ({ point, result: sumps[String(i)] })) };
}

export const preflightRecordSchema = z.preprocess(
  gatherItems,
  z.object({
    bookingId: id("a booking"),
    items: z.record(z.string().max(64), itemSchema).refine((v) => Object.keys(v).length <= 200, { error: "At most 200 checklist items." }),
    sumps: z.array(z.object({ point: z.string().trim().min(1).max(80), result: z.enum(["clear", "contaminated"], { error: "Choose clear, or water or sediment found." }) })).max(50, { error: "At most 50 drain points." }),
    fuelTank: keyList,
    fuelQuantity: weightList("the fuel", 5_000),
    oilQuantity: decimal("the oil quantity", { max: 50 }),
    notes: z.preprocess(blank, z.string().trim().max(2000, { error: "Keep the notes to 2000 characters." }).optional()).transform((v) => v ?? null),
  }),
);

export type WeightBalanceProfileInput = z.output<typeof weightBalanceProfileSchema>;
export type LoadingFormInput = z.output<typeof loadingSchema>;
export type PreflightRecordInput = z.output<typeof preflightRecordSchema>;

/** A page's query (Next's searchParams) as the schemas read forms: "name[]" keys become arrays. */
export function queryToObject(query: Record<string, string | string[] | undefined>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined) continue;
    if (key.endsWith("[]")) out[key.slice(0, -2)] = Array.isArray(value) ? value : [value];
    else out[key] = Array.isArray(value) ? value[0] : value;
  }
  return out;
}
