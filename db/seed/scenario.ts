import type { Role } from "@/permissions/roles";

// The invented demo scenario: an invented regional association with three invented clubs.
// No real people, clubs, airfields or registrations.
export const DEMO_PASSWORD = "hangar-demo-2026";

export const ASSOCIATION = "Prairie Wing Association";

// Home field positions are invented points (no real airfield), near each club's time zone, so
// that sunrise and sunset (night under 14 CFR 61.57(b)) can be computed in the demo.
export const DEMO_CLUBS = [
  { key: "cottonwood", slug: "cottonwood-flyers", name: "Cottonwood Flyers", timeZone: "America/Denver", currency: "USD", unitSystem: "imperial" as const, home: { latitude: 39.4127, longitude: -104.6283 } },
  { key: "reedwater", slug: "reedwater", name: "Reedwater Flying Society", timeZone: "America/Chicago", currency: "USD", unitSystem: "imperial" as const, home: { latitude: 41.7093, longitude: -88.4417 } },
  { key: "silberau", slug: "aeroclub-silberau", name: "Aeroclub Silberau", timeZone: "Europe/Berlin", currency: "EUR", unitSystem: "metric" as const, home: { latitude: 52.0871, longitude: 13.2164 } },
];

export type DemoPerson = { email: string; name: string; operator?: boolean; clubs: Partial<Record<string, Role[]>> };

export const DEMO_PEOPLE: DemoPerson[] = [
  { email: "member@hangarline.test", name: "Rowan Pike", clubs: { reedwater: ["member"] } },
  { email: "instructor@hangarline.test", name: "Imani Ostrowski", clubs: { reedwater: ["member", "instructor"] } },
  { email: "safety@hangarline.test", name: "Sigrid Alvarado", clubs: { reedwater: ["member", "safety"] } },
  { email: "treasurer@hangarline.test", name: "Tomas Quillfeather", clubs: { reedwater: ["member", "treasurer"] } },
  { email: "maintenance@hangarline.test", name: "Mei Lindqvist", clubs: { reedwater: ["member", "maintenance"] } },
  { email: "admin@hangarline.test", name: "Abena Carrow", clubs: { reedwater: ["member", "admin"] } },
  { email: "mechanic@hangarline.test", name: "Hollis Fairbank", clubs: { reedwater: ["mechanic"] } },
  { email: "operator@hangarline.test", name: "Orla Brightwater", operator: true, clubs: {} },
  { email: "twoclubs@hangarline.test", name: "Casey Marchetti", clubs: { reedwater: ["member"], cottonwood: ["member", "instructor"] } },
  { email: "cottonwood.admin@hangarline.test", name: "Wren Okafor", clubs: { cottonwood: ["member", "admin", "treasurer"] } },
  { email: "cottonwood.maint@hangarline.test", name: "Jory Tallis", clubs: { cottonwood: ["member", "maintenance", "safety"] } },
  { email: "cottonwood.pilot@hangarline.test", name: "Nell Variano", clubs: { cottonwood: ["member"] } },
  { email: "silberau.admin@hangarline.test", name: "Henrike Maasdorp", clubs: { silberau: ["member", "admin", "treasurer"] } },
  { email: "silberau.technik@hangarline.test", name: "Lutz Ebersbach", clubs: { silberau: ["member", "maintenance", "safety"] } },
  { email: "silberau.pilot@hangarline.test", name: "Carla Weidenfels", clubs: { silberau: ["member"] } },
  { email: "student@hangarline.test", name: "Devi Ramaswamy", clubs: { reedwater: ["member"] } },
  { email: "pilot2@hangarline.test", name: "Gus Henneberry", clubs: { reedwater: ["member"] } },
];
