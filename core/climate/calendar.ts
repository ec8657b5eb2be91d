/**
 * Calendar helpers for climate records: Gregorian leap years, month lengths and strict parsing of
 * calendar dates written as `YYYY-MM-DD` or `YYYYMMDD`.
 *
 * Source: Gregorian calendar rule (a year is a leap year when divisible by 4, except centuries not
 * divisible by 400) — common practice. Validity: years 1700 to 2200 (station records).
 */

/** Earliest and latest calendar year accepted in a climate record. */
export const CLIMATE_YEAR_RANGE = { min: 1700, max: 2200, unit: 'year' } as const;

/** True when `year` is a Gregorian leap year. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Number of days (28..31) in `month` (1..12) of `year`. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** A calendar day. */
export interface CalendarDate {
  readonly year: number;
  /** 1..12. */
  readonly month: number;
  /** 1..31. */
  readonly day: number;
}

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const COMPACT_DATE = /^(\d{4})(\d{2})(\d{2})$/;

/**
 * Parses `YYYY-MM-DD` (or `YYYYMMDD` when `compact` is true) into a calendar date; returns a reason
 * string instead when the text is not a real date in the accepted year range.
 */
export function parseCalendarDate(text: string, compact = false): CalendarDate | string {
  const m = (compact ? COMPACT_DATE : ISO_DATE).exec(text);
  if (!m) return `expected a date written ${compact ? 'YYYYMMDD' : 'YYYY-MM-DD'}`;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (year < CLIMATE_YEAR_RANGE.min || year > CLIMATE_YEAR_RANGE.max) {
    return `year ${year} is outside ${CLIMATE_YEAR_RANGE.min}..${CLIMATE_YEAR_RANGE.max}`;
  }
  if (month < 1 || month > 12) return `month ${month} is not 1..12`;
  const n = daysInMonth(year, month);
  if (day < 1 || day > n) return `day ${day} does not exist in ${year}-${pad2(month)} (${n} days)`;
  return { year, month, day };
}

/** `YYYY-MM-DD` text of a calendar date. */
export function formatCalendarDate(d: CalendarDate): string {
  return `${String(d.year).padStart(4, '0')}-${pad2(d.month)}-${pad2(d.day)}`;
}

/** Two-digit month or day. */
export function pad2(n: number): string {
  return String(n).padStart(2, '0');
}
