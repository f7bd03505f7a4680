// Pilot currency rules (14 CFR Part 61). The currency board and the booking guards both call
// these, so a member is never "current" on one screen and "not current" on another.
export {
  PASSENGER_CURRENCY_DAYS,
  PASSENGER_CURRENCY_LANDINGS,
  lastDayOfWindow,
  passengerCurrency,
  recencyInType,
  type CurrencyAircraft,
  type CurrencyStatus,
  type LandingEntry,
} from "./passenger-currency";
export { ageOn, basicMedStatus, medicalDurationMonths, medicalExpiry, medicalMonthsFor, medicalPrivilegeDates, MEDICAL_PRIVILEGES, type MedicalPrivilege } from "./medical";
export { documentExpiryStatus, flightReviewDue, type DocumentStatus } from "./flight-review";
export { AIRCRAFT_CATEGORIES, AIRCRAFT_CLASSES, aircraftClassKey, aircraftClassLabel, distinctClasses, normalizeClassWord, type AircraftClass } from "./aircraft-class";
