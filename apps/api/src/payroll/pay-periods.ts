import type { PayFrequency } from '@tressury/schema';

export type PeriodRange = { startDate: string; endDate: string };
export type PayCalendar = { frequency: PayFrequency; anchorDate: string };

const DAY_MS = 86_400_000;

const toDay = (date: string): number => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d) / DAY_MS;
};
const toDate = (day: number): string => new Date(day * DAY_MS).toISOString().slice(0, 10);

/** The calendar day `days` after `date` (YYYY-MM-DD, no time zone). */
export const addDays = (date: string, days: number): string => toDate(toDay(date) + days);

/**
 * The pay period holding `date`. Weekly and biweekly periods repeat every 7 or 14 days from the anchor
 * (a period's first day), backwards as well as forwards; semi-monthly periods run from the 1st to the
 * 15th and from the 16th to the month's last day (common practice for US semi-monthly payrolls).
 */
export function payPeriodContaining(calendar: PayCalendar, date: string): PeriodRange {
  if (calendar.frequency === 'semi-monthly') {
    const [y, m, d] = date.split('-').map(Number) as [number, number, number];
    const monthStart = toDate(Date.UTC(y, m - 1, 1) / DAY_MS);
    const monthEnd = toDate(Date.UTC(y, m, 0) / DAY_MS);
    return d <= 15 ? { startDate: monthStart, endDate: addDays(monthStart, 14) } : { startDate: addDays(monthStart, 15), endDate: monthEnd };
  }
  const length = calendar.frequency === 'weekly' ? 7 : 14;
  const anchor = toDay(calendar.anchorDate);
  const offset = toDay(date) - anchor;
  const start = anchor + Math.floor(offset / length) * length;
  return { startDate: toDate(start), endDate: toDate(start + length - 1) };
}

export const payPeriodAfter = (calendar: PayCalendar, period: PeriodRange): PeriodRange => payPeriodContaining(calendar, addDays(period.endDate, 1));

export const isPeriodStart = (calendar: PayCalendar, date: string): boolean => payPeriodContaining(calendar, date).startDate === date;
