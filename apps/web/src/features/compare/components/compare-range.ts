import { isBusinessDate } from '../../../lib/business-date';
import { addDays, type DateRange, daysIn } from './date-ranges';

/** What the comparison is asked for; it lives in the address so it survives reloads and drill-downs. */
export type CompareRange = DateRange & { rebookingDays: number };

// A client who comes back within six weeks counts as rebooked unless the owner says otherwise (common practice).
export const DEFAULT_REBOOKING_DAYS = 42;
export const MAX_REBOOKING_DAYS = 365;
/** The longest range the API compares: a year, leap day included. */
export const MAX_RANGE_DAYS = 366;

const wholeDays = (text: string | null): number | null => (text !== null && /^\d{1,3}$/.test(text) ? Number(text) : null);

/** The range in `?from=&to=&rebookingDays=`, or the last 90 days to `today` when it is missing or malformed. */
export function readRange(search: URLSearchParams, today: string): CompareRange {
  const from = search.get('from');
  const to = search.get('to');
  const days = wholeDays(search.get('rebookingDays'));
  const rebookingDays = days !== null && days >= 1 && days <= MAX_REBOOKING_DAYS ? days : DEFAULT_REBOOKING_DAYS;
  if (isBusinessDate(from) && isBusinessDate(to) && from <= to && daysIn({ from, to }) <= MAX_RANGE_DAYS) return { from, to, rebookingDays };
  return { from: addDays(today, -89), to: today, rebookingDays };
}

/** The search string for a range, e.g. to carry it into a drill-down link. */
export function rangeSearch(range: CompareRange): string {
  return `?${new URLSearchParams({ from: range.from, to: range.to, rebookingDays: String(range.rebookingDays) })}`;
}
