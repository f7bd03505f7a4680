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

/**
 * Last day of private-pilot privileges on a medical certificate, 14 CFR 61.23(d): any class
 * (first and second revert to third-class privileges) lasts 60 calendar months when the
 * pilot is under 40 on the exam date, 24 when 40 or older, and expires at the end of the
 * last day of the Nth month after the month of the exam.
 */
export function medicalExpiry(input: { medicalClass: 1 | 2 | 3; examDate: IsoDate; birthDate: IsoDate }): IsoDate {
  if (input.medicalClass !== 1 && input.medicalClass !== 2 && input.medicalClass !== 3) {
    throw new RangeError(`Medical class must be 1, 2 or 3, got ${String(input.medicalClass)}`);
  }
  const months = medicalDurationMonths(ageOn(input.birthDate, input.examDate));
  return endOfMonthAfter(input.examDate, months);
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
