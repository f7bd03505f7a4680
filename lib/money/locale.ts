// A club's locale (a BCP 47 tag): which ones it may choose, the one an existing club starts with,
// and the paper its PDFs are printed on. Pure; formatting itself is lib/money/format.ts (money,
// numbers) and lib/dates (dates).
import { DEFAULT_LOCALE } from "./format";

/** The locales the settings page offers, with their names in their own language. */
export const CLUB_LOCALES = [
  { tag: "en-US", name: "English (United States)" },
  { tag: "en-CA", name: "English (Canada)" },
  { tag: "fr-CA", name: "Français (Canada)" },
  { tag: "es-MX", name: "Español (México)" },
  { tag: "en-GB", name: "English (United Kingdom)" },
  { tag: "en-IE", name: "English (Ireland)" },
  { tag: "en-AU", name: "English (Australia)" },
  { tag: "en-NZ", name: "English (New Zealand)" },
  { tag: "de-DE", name: "Deutsch (Deutschland)" },
  { tag: "de-AT", name: "Deutsch (Österreich)" },
  { tag: "de-CH", name: "Deutsch (Schweiz)" },
  { tag: "fr-FR", name: "Français (France)" },
  { tag: "fr-BE", name: "Français (Belgique)" },
  { tag: "nl-NL", name: "Nederlands (Nederland)" },
  { tag: "nl-BE", name: "Nederlands (België)" },
  { tag: "es-ES", name: "Español (España)" },
  { tag: "it-IT", name: "Italiano (Italia)" },
  { tag: "pt-PT", name: "Português (Portugal)" },
  { tag: "fi-FI", name: "Suomi (Suomi)" },
  { tag: "sv-SE", name: "Svenska (Sverige)" },
  { tag: "nb-NO", name: "Norsk bokmål (Norge)" },
  { tag: "da-DK", name: "Dansk (Danmark)" },
  { tag: "pl-PL", name: "Polski (Polska)" },
  { tag: "cs-CZ", name: "Čeština (Česko)" },
  { tag: "ja-JP", name: "日本語 (日本)" },
] as const;

export type ClubLocaleTag = (typeof CLUB_LOCALES)[number]["tag"];

export function isClubLocale(tag: string): tag is ClubLocaleTag {
  return CLUB_LOCALES.some((l) => l.tag === tag);
}

const EURO_BY_TIME_ZONE: Record<string, ClubLocaleTag> = {
  "Europe/Paris": "fr-FR",
  "Europe/Madrid": "es-ES",
  "Europe/Rome": "it-IT",
  "Europe/Amsterdam": "nl-NL",
  "Europe/Brussels": "nl-BE",
  "Europe/Vienna": "de-AT",
  "Europe/Dublin": "en-IE",
  "Europe/Lisbon": "pt-PT",
  "Europe/Helsinki": "fi-FI",
};

const BY_CURRENCY: Record<string, ClubLocaleTag> = {
  USD: "en-US",
  CAD: "en-CA",
  MXN: "es-MX",
  GBP: "en-GB",
  AUD: "en-AU",
  NZD: "en-NZ",
  CHF: "de-CH",
  SEK: "sv-SE",
  NOK: "nb-NO",
  DKK: "da-DK",
  PLN: "pl-PL",
  CZK: "cs-CZ",
  JPY: "ja-JP",
};

/**
 * The locale a club starts with, from its currency and time zone (migration 0026 applies the same
 * table to existing clubs): USD → en-US, a euro club in Europe/Paris → fr-FR, any other euro club
 * de-DE, an unknown currency en-US.
 */
export function defaultLocaleFor(currency: string, timeZone: string): ClubLocaleTag {
  const code = currency.toUpperCase();
  if (code === "EUR") return EURO_BY_TIME_ZONE[timeZone] ?? "de-DE";
  return BY_CURRENCY[code] ?? (DEFAULT_LOCALE as ClubLocaleTag);
}

/** The region of a tag ("de-DE" → "DE"), or null when it names none ("de"). */
export function regionOf(locale: string): string | null {
  try {
    return new Intl.Locale(locale).maximize().region ?? null;
  } catch {
    return null;
  }
}

/**
 * Countries whose everyday paper is US Letter (8.5 × 11 in, ANSI/ASME Y14.1 size A): the United
 * States and its territories, Canada, Mexico, and a few others in the Americas. Everywhere else
 * uses A4 (210 × 297 mm, ISO 216).
 */
const LETTER_REGIONS = new Set(["US", "PR", "GU", "VI", "AS", "MP", "UM", "CA", "MX", "GT", "SV", "HN", "NI", "CR", "PA", "DO", "VE", "CO", "CL", "PH", "BZ"]);

export type PaperSize = "LETTER" | "A4";

/** The one place a PDF's paper is chosen: Letter for the Americas' Letter countries, A4 otherwise. */
export function paperSizeFor(locale: string): PaperSize {
  const region = regionOf(locale);
  return region !== null && LETTER_REGIONS.has(region) ? "LETTER" : "A4";
}
