import { ValidationFailedError } from '../common/validation-failed.error.js';

/** Longest range the comparison answers for: a year, leap day included. */
export const MAX_RANGE_DAYS = 366;
export const DEFAULT_REBOOKING_DAYS = 42;

const dayNumber = (date: string): number => Date.parse(`${date}T00:00:00Z`) / 86_400_000;

export function dateAfter(date: string, days: number): string {
  return new Date((dayNumber(date) + days) * 86_400_000).toISOString().slice(0, 10);
}

/** Every business date from `from` to `to`, both included. */
export function datesOf(from: string, to: string): string[] {
  const dates: string[] = [];
  for (let day = dayNumber(from); day <= dayNumber(to); day++) dates.push(new Date(day * 86_400_000).toISOString().slice(0, 10));
  return dates;
}

/** A range the comparison accepts: `to` not before `from`, and no longer than a year. */
export function checkRange(from: string, to: string): void {
  const days = dayNumber(to) - dayNumber(from) + 1;
  if (days < 1) throw new ValidationFailedError([{ field: 'to', message: 'to must be on or after from' }]);
  if (days > MAX_RANGE_DAYS) throw new ValidationFailedError([{ field: 'to', message: `the range may cover at most ${MAX_RANGE_DAYS} days` }]);
}

/** The first and last day of a YYYY-MM month. */
export function monthRange(month: string): { from: string; to: string } {
  const [year, monthNumber] = month.split('-').map(Number) as [number, number];
  const from = `${month}-01`;
  const to = new Date(Date.UTC(year, monthNumber, 0)).toISOString().slice(0, 10);
  return { from, to };
}
