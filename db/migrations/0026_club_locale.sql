-- Each club formats money, numbers and dates for its own locale (a BCP 47 tag). Existing clubs
-- get one from their currency and time zone (the same table as lib/money/locale.ts defaultLocaleFor).
ALTER TABLE `clubs` ADD `locale` text DEFAULT 'en-US' NOT NULL;
--> statement-breakpoint
UPDATE `clubs` SET `locale` = CASE
  WHEN `currency` = 'USD' THEN 'en-US'
  WHEN `currency` = 'CAD' THEN 'en-CA'
  WHEN `currency` = 'MXN' THEN 'es-MX'
  WHEN `currency` = 'GBP' THEN 'en-GB'
  WHEN `currency` = 'AUD' THEN 'en-AU'
  WHEN `currency` = 'NZD' THEN 'en-NZ'
  WHEN `currency` = 'CHF' THEN 'de-CH'
  WHEN `currency` = 'SEK' THEN 'sv-SE'
  WHEN `currency` = 'NOK' THEN 'nb-NO'
  WHEN `currency` = 'DKK' THEN 'da-DK'
  WHEN `currency` = 'PLN' THEN 'pl-PL'
  WHEN `currency` = 'CZK' THEN 'cs-CZ'
  WHEN `currency` = 'JPY' THEN 'ja-JP'
  WHEN `currency` = 'EUR' THEN CASE `time_zone`
    WHEN 'Europe/Paris' THEN 'fr-FR'
    WHEN 'Europe/Madrid' THEN 'es-ES'
    WHEN 'Europe/Rome' THEN 'it-IT'
    WHEN 'Europe/Amsterdam' THEN 'nl-NL'
    WHEN 'Europe/Brussels' THEN 'nl-BE'
    WHEN 'Europe/Vienna' THEN 'de-AT'
    WHEN 'Europe/Dublin' THEN 'en-IE'
    WHEN 'Europe/Lisbon' THEN 'pt-PT'
    WHEN 'Europe/Helsinki' THEN 'fi-FI'
    WHEN 'Europe/Luxembourg' THEN 'fr-LU'
    ELSE 'de-DE' END
  ELSE 'en-US' END;
