import { invalid } from '../fields.js';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

// Proleptic Gregorian calendar arithmetic on whole days (no clock, no time zone): a business date is already local.
function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146097 + dayOfEra - 719468;
}

function civilFromDays(days: number): [number, number, number] {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const dayOfEra = z - era * 146097;
  const yearOfEra = Math.floor((dayOfEra - Math.floor(dayOfEra / 1460) + Math.floor(dayOfEra / 36524) - Math.floor(dayOfEra / 146096)) / 365);
  const dayOfYear = dayOfEra - (365 * yearOfEra + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100));
  const mp = Math.floor((5 * dayOfYear + 2) / 153);
  const day = dayOfYear - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return [yearOfEra + era * 400 + (month <= 2 ? 1 : 0), month, day];
}

/** 'YYYY-MM-DD' to days since 1970-01-01; an impossible date such as 2025-02-29 is refused. */
export function parseBusinessDate(value: unknown, field: string): number {
  const match = typeof value === 'string' ? ISO_DATE.exec(value) : null;
  if (match) {
    const days = daysFromCivil(Number(match[1]), Number(match[2]), Number(match[3]));
    if (formatBusinessDate(days) === value) return days;
  }
  throw invalid(field, `${field} must be a calendar date written YYYY-MM-DD`);
}

export function formatBusinessDate(days: number): string {
  const [year, month, day] = civilFromDays(days);
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** 0 = Sunday … 6 = Saturday; 1970-01-01 was a Thursday. */
export function weekdayOf(days: number): number {
  return (((days + 4) % 7) + 7) % 7;
}

/** First day of the workweek holding `days`, for weeks beginning on `startsOn`. */
export function workweekStart(days: number, startsOn: number): number {
  return days - ((weekdayOf(days) - startsOn + 7) % 7);
}
