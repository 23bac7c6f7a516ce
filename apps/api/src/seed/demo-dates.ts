import { demoBusiness } from '@tressury/fixtures';
import { businessDateIn } from '../common/business-date.js';

/** The calendar day before a business date (YYYY-MM-DD). */
export function dayBefore(date: string): string {
  const day = new Date(`${date}T00:00:00Z`);
  day.setUTCDate(day.getUTCDate() - 1);
  return day.toISOString().slice(0, 10);
}

/**
 * Yesterday in each demo branch's own time zone: the last day the demo fills and closes. Branches a time
 * zone apart can be on different dates for an hour or two around midnight; each gets its own.
 */
export function demoEndDates(now: Date = new Date()): { endDate: string; endDates: Record<string, string> } {
  const endDates = Object.fromEntries(demoBusiness.branches.map((branch) => [branch.key, dayBefore(businessDateIn(branch.timeZone, now))]));
  const endDate = Object.values(endDates).sort()[0]!;
  return { endDate, endDates };
}
