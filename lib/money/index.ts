// Money rules: integer minor units in the club's currency, rounding half away from zero, no
// I/O. The ledger, billing run, statements and reconciliation all call these.
export { prorate, countDaysInclusive } from "./proration";
export { flightCharge, meterTimeCharge, previewFlightCharge, type FlightChargeInput, type FlightChargePreview } from "./flight-charge";
export { roundHalfAwayFromZero, roundQuotient, subtractExact } from "./decimal";
export {
  assertBalanced,
  balancesByAccount,
  findEntryProblem,
  isBalanced,
  reversalOf,
  signedAmountOf,
  totalsOf,
  UnbalancedEntryError,
  type AccountId,
  type JournalEntry,
  type JournalLine,
  type LedgerProblem,
  type LedgerProblemCode,
} from "./ledger";
export {
  DEFAULT_CHART,
  FLYING_CLUB_CHART,
  SYSTEM_ACCOUNT_CODES,
  chartChangeProblems,
  chartDeleteProblem,
  normalSideOf,
  presentBalance,
  type AccountType,
  type ChartAccount,
  type ChartAccountRow,
  type ChartChange,
} from "./chart";
export { clubMoney, currencyExponent, DEFAULT_LOCALE, formatMoney, formatNumber, minorToDecimalString, moneyFormatter, toMinorUnits, type MoneyLocale } from "./format";
export { CLUB_LOCALES, defaultLocaleFor, isClubLocale, paperSizeFor, regionOf, type ClubLocaleTag, type PaperSize } from "./locale";
export {
  engineReservePerHour,
  hourlyRate,
  rateTable,
  type HourlyRate,
  type HourlyRateInput,
  type RateTableRow,
} from "./rates";
export {
  AGEING_BUCKETS,
  ageingBucketOf,
  ageReceivables,
  daysPastDue,
  isInArrears,
  lateFee,
  latefee,
  type AgedItem,
  type AgeingBucket,
  type AgeingBucketKey,
  type AgeingReport,
  type LateFeePolicy,
  type ReceivableItem,
} from "./receivables";
export { duesForMember, duesPeriod, type DuesForMemberInput, type DuesPeriodRange, type DuesPlanPeriod } from "./dues";
