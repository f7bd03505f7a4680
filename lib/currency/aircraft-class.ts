// Category and class of aircraft as 14 CFR 61.5 names them, for passenger currency
// (14 CFR 61.57(a)(1)(i): "in an aircraft of the same category, class, and type (if a type
// rating is required)"). Stored as the words below; compared loosely (case, hyphens and spaces
// ignored) so "Single-engine land" and "single engine land" are the same class.

export const AIRCRAFT_CATEGORIES = ["Airplane", "Rotorcraft", "Glider", "Lighter-than-air", "Powered-lift", "Powered parachute", "Weight-shift-control aircraft"] as const;

export const AIRCRAFT_CLASSES = [
  "Single-engine land",
  "Multiengine land",
  "Single-engine sea",
  "Multiengine sea",
  "Helicopter",
  "Gyroplane",
  "Airship",
  "Balloon",
  "Glider",
  "Powered-lift",
  "Powered parachute land",
  "Powered parachute sea",
  "Weight-shift-control land",
  "Weight-shift-control sea",
] as const;

/** Lower-case letters only: "Multi-engine Land" and "multiengine land" compare equal. */
export function normalizeClassWord(value: string | null | undefined): string {
  return (value ?? "").toLowerCase().replace(/[^a-z]/g, "");
}

export type AircraftClass = { category: string; classRating: string; tailwheel?: boolean };

/** Stable key of a category and class (and tailwheel), for grouping and item keys. */
export function aircraftClassKey(c: AircraftClass): string {
  return `${normalizeClassWord(c.category)}/${normalizeClassWord(c.classRating)}${c.tailwheel ? "/tailwheel" : ""}`;
}

/** "Airplane single-engine land (tailwheel)". */
export function aircraftClassLabel(c: AircraftClass): string {
  return `${c.category} ${c.classRating.charAt(0).toLowerCase()}${c.classRating.slice(1)}${c.tailwheel ? " (tailwheel)" : ""}`;
}

/** The distinct classes in a list (a fleet), tailwheel apart from tricycle, sorted by label. */
export function distinctClasses(list: AircraftClass[]): AircraftClass[] {
  const seen = new Map<string, AircraftClass>();
  for (const c of list) {
    const k = aircraftClassKey(c);
    if (!seen.has(k)) seen.set(k, { category: c.category, classRating: c.classRating, tailwheel: Boolean(c.tailwheel) });
  }
  return [...seen.values()].sort((a, b) => aircraftClassLabel(a).localeCompare(aircraftClassLabel(b)));
}
