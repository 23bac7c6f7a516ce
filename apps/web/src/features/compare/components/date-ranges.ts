/** A span of business dates, both ends included, as YYYY-MM-DD. */
export type DateRange = { from: string; to: string };

export type RangePreset = 'this-week' | 'last-pay-period' | 'month-to-date' | 'last-90-days';

/** The pay calendar as GET /api/payroll/periods gives it. */
export type PayCalendar = { frequency: 'weekly' | 'biweekly' | 'semi-monthly'; anchorDate: string; workweekStartsOn: number };

export const presetLabels: Record<RangePreset, string> = {
  'this-week': 'This week',
  'last-pay-period': 'Last pay period',
  'month-to-date': 'Month to date',
  'last-90-days': 'Last 90 days',
};

export const rangePresets = Object.keys(presetLabels) as RangePreset[];

const DAY_MS = 86_400_000;

// Calendar arithmetic on UTC midnights: a business date carries no time zone of its own.
const dayNumber = (date: string): number => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d) / DAY_MS;
};
const dateOf = (day: number): string => new Date(day * DAY_MS).toISOString().slice(0, 10);

export const addDays = (date: string, days: number): string => dateOf(dayNumber(date) + days);

/** Days in the range, both ends counted. */
export const daysIn = (range: DateRange): number => dayNumber(range.to) - dayNumber(range.from) + 1;

/** 0 = Sunday … 6 = Saturday. */
export const weekdayOf = (date: string): number => new Date(dayNumber(date) * DAY_MS).getUTCDay();

/** The first day of the week holding `date`, for weeks that begin on `weekStartsOn`. */
export function weekStart(date: string, weekStartsOn: number): string {
  return addDays(date, -((weekdayOf(date) - weekStartsOn + 7) % 7));
}

/**
 * The pay period holding `date`: weekly and biweekly periods repeat every 7 or 14 days from the anchor,
 * backwards as well as forwards; semi-monthly ones run 1st–15th and 16th–month end (common practice).
 */
export function payPeriodHolding(calendar: PayCalendar, date: string): DateRange {
  if (calendar.frequency === 'semi-monthly') {
    const monthStart = `${date.slice(0, 8)}01`;
    if (Number(date.slice(8, 10)) <= 15) return { from: monthStart, to: addDays(monthStart, 14) };
    const [y, m] = date.split('-').map(Number) as [number, number];
    return { from: addDays(monthStart, 15), to: dateOf(Date.UTC(y, m, 0) / DAY_MS) };
  }
  const length = calendar.frequency === 'weekly' ? 7 : 14;
  const anchor = dayNumber(calendar.anchorDate);
  const start = anchor + Math.floor((dayNumber(date) - anchor) / length) * length;
  return { from: dateOf(start), to: dateOf(start + length - 1) };
}

/**
 * The dates a preset stands for on `today` (the business date in the branch's time zone). "This week"
 * begins on the workweek's first day; without a pay calendar there is no last pay period (null).
 */
export function presetRange(preset: RangePreset, today: string, calendar: PayCalendar | null): DateRange | null {
  switch (preset) {
    case 'this-week':
      return { from: weekStart(today, calendar?.workweekStartsOn ?? 0), to: today };
    case 'last-pay-period':
      return calendar ? payPeriodHolding(calendar, addDays(payPeriodHolding(calendar, today).from, -1)) : null;
    case 'month-to-date':
      return { from: `${today.slice(0, 8)}01`, to: today };
    case 'last-90-days':
      return { from: addDays(today, -89), to: today };
  }
}

/** The preset whose dates are exactly `range` today, if any, so the picker can show it as chosen. */
export function presetMatching(range: DateRange, today: string, calendar: PayCalendar | null): RangePreset | null {
  return rangePresets.find((preset) => {
    const dates = presetRange(preset, today, calendar);
    return dates !== null && dates.from === range.from && dates.to === range.to;
  }) ?? null;
}

/** "2026-01" → "2025-12". */
export function monthBefore(month: string): string {
  const [y, m] = month.split('-').map(Number) as [number, number];
  return m === 1 ? `${y - 1}-12` : `${y}-${String(m - 1).padStart(2, '0')}`;
}

/** The month holding `today` and the `count - 1` before it, newest first. */
export function recentMonths(today: string, count: number): string[] {
  const months = [today.slice(0, 7)];
  while (months.length < count) months.push(monthBefore(months[months.length - 1] as string));
  return months;
}
