// The paper size of the club's printed reports. The one place that decides it: North America
// and a few countries that follow it use US Letter; everywhere else uses ISO A4 (common practice;
// the CLDR "paper size" preference lists the same countries). With a locale (e.g. "en-US",
// "fr-CA", "de-DE") its region decides; without one, a club keeping its books in US dollars is
// taken as a US club.

export type PaperSize = "LETTER" | "A4";

const LETTER_REGIONS: ReadonlySet<string> = new Set(["US", "CA", "MX", "PR", "PH", "CL", "CO", "VE", "GT", "SV", "NI", "CR", "PA", "DO", "BZ"]);

export function paperSizeFor(club: { locale?: string | null; currency: string }): PaperSize {
  const region = club.locale ? /^[a-z]{2,3}(?:[-_][A-Za-z]{4})?[-_]([A-Za-z]{2}|\d{3})\b/i.exec(club.locale)?.[1]?.toUpperCase() : undefined;
  if (region) return LETTER_REGIONS.has(region) ? "LETTER" : "A4";
  return club.currency.toUpperCase() === "USD" ? "LETTER" : "A4";
}
