import { formatBusinessDate, parseBusinessDate } from './business-date.js';

export type PayFrequency = 'weekly' | 'biweekly' | 'semi-monthly';
export type PeriodRange = { startDate: string; endDate: string };
/** `anchorDate` is the first day of any one period (weekly, biweekly); semi-monthly periods ignore it. */
export type PayCalendar = { frequency: PayFrequency; anchorDate: string };

/** The calendar day `days` after `date` (YYYY-MM-DD, no time zone). */
export const addDays = (date: string, days: number): string => formatBusinessDate(parseBusinessDate(date, 'date') + days);

/**
 * The pay period holding `date`. Weekly and biweekly periods repeat every 7 or 14 days from the anchor
 * (a period's first day), backwards as well as forwards; semi-monthly periods run from the 1st to the
 * 15th and from the 16th to the month's last day (common practice for US semi-monthly payrolls).
 */
export function payPeriodContaining(calendar: PayCalendar, date: string): PeriodRange {
  const day = parseBusinessDate(date, 'date');
  if (calendar.frequency === 'semi-monthly') {
    const [year, month, dayOfMonth] = date.split('-').map(Number) as [number, number, number];
    const monthStart = day - dayOfMonth + 1;
    if (dayOfMonth <= 15) return { startDate: formatBusinessDate(monthStart), endDate: formatBusinessDate(monthStart + 14) };
    const nextMonthStart = parseBusinessDate(month === 12 ? `${year + 1}-01-01` : `${year}-${String(month + 1).padStart(2, '0')}-01`, 'date');
    return { startDate: formatBusinessDate(monthStart + 15), endDate: formatBusinessDate(nextMonthStart - 1) };
  }
  const length = calendar.frequency === 'weekly' ? 7 : 14;
  const anchor = parseBusinessDate(calendar.anchorDate, 'anchorDate');
  const start = anchor + Math.floor((day - anchor) / length) * length;
  return { startDate: formatBusinessDate(start), endDate: formatBusinessDate(start + length - 1) };
}

export const payPeriodAfter = (calendar: PayCalendar, period: PeriodRange): PeriodRange => payPeriodContaining(calendar, addDays(period.endDate, 1));

export const isPeriodStart = (calendar: PayCalendar, date: string): boolean => payPeriodContaining(calendar, date).startDate === date;
