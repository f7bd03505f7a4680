import { compareIsoDates, endOfMonthAfter, formatIsoDate, lastDayOfMonth, parseIsoDate, shiftMonth, type IsoDate } from "@/lib/dates";

/**
 * Age in whole years on `onDate`. A birthday counts from the day itself (someone born on
 * 1985-05-10 is 40 on 2025-05-10). Someone born on 29 February turns a year older on
 * 1 March in a common year (the anniversary has not passed on 28 February) — our documented
 * convention, the same as a plain month/day comparison.
 */
export function ageOn(birthDate: IsoDate, onDate: IsoDate): number {
  const b = parseIsoDate(birthDate);
  const d = parseIsoDate(onDate);
  if (compareIsoDates(onDate, birthDate) < 0) throw new RangeError(`${onDate} is before the birth date ${birthDate}`);
  const beforeBirthday = d.month < b.month || (d.month === b.month && d.day < b.day);
  return d.year - b.year - (beforeBirthday ? 1 : 0);
}

/** Calendar months a medical lasts for private-pilot privileges, 14 CFR 61.23(d). */
export function medicalDurationMonths(ageOnExamDate: number): 24 | 60 {
  return ageOnExamDate < 40 ? 60 : 24;
}

/** The privileges a medical can carry: ATP (first class), commercial (second), private (third). */
export type MedicalPrivilege = "private" | "commercial" | "atp";
export const MEDICAL_PRIVILEGES: readonly MedicalPrivilege[] = ["atp", "commercial", "private"];

/**
 * Calendar months a medical of `medicalClass` lasts for `privilege`, or null when that class
 * cannot carry that privilege; 14 CFR 61.23(d):
 * - first class: ATP 12 months under 40, 6 months 40 or over (61.23(d)(1)(i), (ii)); commercial
 *   12 months at any age (61.23(d)(1)(iii)); private 60 / 24 (61.23(d)(1)(iv), (v));
 * - second class: commercial 12 (61.23(d)(2)(i)); private 60 / 24 (61.23(d)(2)(ii), (iii)); no ATP;
 * - third class: private 60 / 24 (61.23(d)(3)); no commercial, no ATP (61.23(a)).
 * Age is the age on the exam date. (The 61.23(d) rows for flight instructor and other
 * third-class operations come to the same as "private".)
 */
export function medicalMonthsFor(medicalClass: 1 | 2 | 3, privilege: MedicalPrivilege, ageOnExamDate: number): number | null {
  const under40 = ageOnExamDate < 40;
  switch (privilege) {
    case "atp":
      return medicalClass === 1 ? (under40 ? 12 : 6) : null;
    case "commercial":
      return medicalClass === 1 || medicalClass === 2 ? 12 : null;
    case "private":
      return medicalDurationMonths(ageOnExamDate);
  }
}

type MedicalExpiryInput = { medicalClass: 1 | 2 | 3; examDate: IsoDate; birthDate: IsoDate };

/**
 * Last day of `privilege` (default "private") on a medical certificate, 14 CFR 61.23(d): the
 * end of the last day of the Nth calendar month after the month of the exam, N from
 * `medicalMonthsFor` (age on the exam date); null when the class cannot carry that privilege
 * (a third class never carries commercial privileges, only a first class carries ATP ones).
 * A first or second class that has run out for its higher privilege still carries the lower
 * ones to their own dates.
 */
export function medicalExpiry(input: MedicalExpiryInput & { privilege?: "private" }): IsoDate;
export function medicalExpiry(input: MedicalExpiryInput & { privilege?: MedicalPrivilege }): IsoDate | null;
export function medicalExpiry(input: MedicalExpiryInput & { privilege?: MedicalPrivilege }): IsoDate | null {
  if (input.medicalClass !== 1 && input.medicalClass !== 2 && input.medicalClass !== 3) {
    throw new RangeError(`Medical class must be 1, 2 or 3, got ${String(input.medicalClass)}`);
  }
  const privilege = input.privilege ?? "private";
  if (!MEDICAL_PRIVILEGES.includes(privilege)) throw new RangeError(`Privilege must be private, commercial or atp, got ${String(privilege)}`);
  const months = medicalMonthsFor(input.medicalClass, privilege, ageOn(input.birthDate, input.examDate));
  return months === null ? null : endOfMonthAfter(input.examDate, months);
}

/** Every privilege the class carries, highest first, with its last day (14 CFR 61.23(d)). */
export function medicalPrivilegeDates(input: MedicalExpiryInput): { privilege: MedicalPrivilege; lastDay: IsoDate }[] {
  return MEDICAL_PRIVILEGES.flatMap((privilege) => {
    const lastDay = medicalExpiry({ ...input, privilege });
    return lastDay ? [{ privilege, lastDay }] : [];
  });
}

// Plain months (not calendar months): the same day number N months later, or the month's last
// day when that month is shorter.
function addMonthsClamped(date: IsoDate, months: number): IsoDate {
  const { year, month, day } = parseIsoDate(date);
  const t = shiftMonth(year, month, months);
  return formatIsoDate(t.year, t.month, Math.min(day, lastDayOfMonth(t.year, t.month)));
}

/**
 * BasicMed (14 CFR 61.23(c)(3), 61.113(i)): the medical education course within the past 24
 * calendar months (good through the end of the 24th month after the course month) and the
 * physical exam within the previous 48 months, counted as plain months to the day (good
 * through the same date 48 months later). The other conditions (a medical held after
 * 14 July 2006, no disqualifying condition) are recorded by people, not computed here.
 */
export function basicMedStatus(input: { courseDate: IsoDate; examDate: IsoDate }, asOf: IsoDate): {
  current: boolean;
  courseDue: IsoDate;
  examDue: IsoDate;
  lastDay: IsoDate;
} {
  parseIsoDate(asOf);
  const courseDue = endOfMonthAfter(input.courseDate, 24);
  const examDue = addMonthsClamped(input.examDate, 48);
  const lastDay = compareIsoDates(courseDue, examDue) <= 0 ? courseDue : examDue;
  return { current: compareIsoDates(asOf, lastDay) <= 0, courseDue, examDue, lastDay };
}
