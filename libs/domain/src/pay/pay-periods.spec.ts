import { addDays as addCalendarDays, differenceInCalendarDays, format, getDate, getDaysInMonth, parseISO } from 'date-fns';
import { describe, expect, it } from 'vitest';
import { addDays, isPeriodStart, payPeriodAfter, payPeriodContaining, type PayCalendar } from './pay-periods.js';

// Pay-period calendars are common practice in US payroll: weekly (52 a year), biweekly (every other
// week, 26 a year) and semi-monthly (the 1st–15th and the 16th–last day, 24 a year). The sweeps below
// check ours against date-fns, an independent calendar library from the npm registry.
const iso = (date: Date) => format(date, 'yyyy-MM-dd');
const everyDay = (from: string, to: string): string[] => {
  const days: string[] = [];
  for (let d = parseISO(from); iso(d) <= to; d = addCalendarDays(d, 1)) days.push(iso(d));
  return days;
};

describe('pay periods', () => {
  it('repeats weekly periods from the anchor, before and after it', () => {
    const weekly = { frequency: 'weekly' as const, anchorDate: '2026-01-05' };
    expect(payPeriodContaining(weekly, '2026-01-05')).toEqual({ startDate: '2026-01-05', endDate: '2026-01-11' });
    expect(payPeriodContaining(weekly, '2026-03-01')).toEqual({ startDate: '2026-02-23', endDate: '2026-03-01' });
    expect(payPeriodContaining(weekly, '2025-12-31')).toEqual({ startDate: '2025-12-29', endDate: '2026-01-04' });
  });

  it('gives 26 biweekly periods a year of 364 days', () => {
    const biweekly = { frequency: 'biweekly' as const, anchorDate: '2026-01-05' };
    let period = payPeriodContaining(biweekly, '2026-01-05');
    for (let i = 0; i < 26; i++) period = payPeriodAfter(biweekly, period);
    expect(period).toEqual({ startDate: '2027-01-04', endDate: '2027-01-17' });
    expect(isPeriodStart(biweekly, '2026-01-19')).toBe(true);
    expect(isPeriodStart(biweekly, '2026-01-12')).toBe(false);
  });

  it('splits months at the 15th, leap February included', () => {
    const semi = { frequency: 'semi-monthly' as const, anchorDate: '2026-01-01' };
    expect(payPeriodContaining(semi, '2028-02-20')).toEqual({ startDate: '2028-02-16', endDate: '2028-02-29' });
    expect(payPeriodContaining(semi, '2027-02-20')).toEqual({ startDate: '2027-02-16', endDate: '2027-02-28' });
    expect(payPeriodContaining(semi, '2026-12-15')).toEqual({ startDate: '2026-12-01', endDate: '2026-12-15' });
    expect(payPeriodAfter(semi, { startDate: '2026-12-16', endDate: '2026-12-31' })).toEqual({ startDate: '2027-01-01', endDate: '2027-01-15' });
  });

  it.each([
    ['weekly', 7, '2026-03-04'],
    ['biweekly', 14, '2025-11-09'],
  ] as const)('agrees with date-fns on every %s period from 2023 to 2029', (frequency, length, anchorDate) => {
    const calendar: PayCalendar = { frequency, anchorDate };
    for (const date of everyDay('2023-01-01', '2029-12-31')) {
      const { startDate, endDate } = payPeriodContaining(calendar, date);
      const fromAnchor = differenceInCalendarDays(parseISO(startDate), parseISO(anchorDate));
      const into = differenceInCalendarDays(parseISO(date), parseISO(startDate));
      expect([date, fromAnchor % length === 0, into >= 0 && into < length]).toEqual([date, true, true]);
      expect([date, endDate]).toEqual([date, iso(addCalendarDays(parseISO(startDate), length - 1))]);
    }
  });

  it('agrees with date-fns on every semi-monthly period from 2023 to 2029, and periods follow each other without gaps', () => {
    const calendar: PayCalendar = { frequency: 'semi-monthly', anchorDate: '2023-01-01' };
    let previous = payPeriodContaining(calendar, '2022-12-31');
    for (const date of everyDay('2023-01-01', '2029-12-31')) {
      const parsed = parseISO(date);
      const firstHalf = getDate(parsed) <= 15;
      const { startDate, endDate } = payPeriodContaining(calendar, date);
      expect([date, getDate(parseISO(startDate)), getDate(parseISO(endDate))]).toEqual([date, firstHalf ? 1 : 16, firstHalf ? 15 : getDaysInMonth(parsed)]);
      expect([date, startDate.slice(0, 7), endDate.slice(0, 7)]).toEqual([date, date.slice(0, 7), date.slice(0, 7)]);
      if (startDate === date) {
        expect([date, previous.endDate]).toEqual([date, iso(addCalendarDays(parsed, -1))]);
        expect(payPeriodAfter(calendar, previous)).toEqual({ startDate, endDate });
        previous = { startDate, endDate };
      }
    }
  });

  it('adds calendar days as date-fns does, across month, year and leap-day ends', () => {
    for (const date of ['2024-02-28', '2025-02-28', '2026-12-31', '2028-02-29', '2026-03-08', '2026-11-01']) {
      for (const days of [-400, -15, -1, 1, 14, 365]) expect(addDays(date, days)).toBe(iso(addCalendarDays(parseISO(date), days)));
    }
  });

  it('refuses a date that is not on the calendar, naming the field', () => {
    expect(() => payPeriodContaining({ frequency: 'weekly', anchorDate: '2026-01-05' }, '2026-02-30')).toThrow(/date must be a calendar date/);
    expect(() => payPeriodContaining({ frequency: 'weekly', anchorDate: '2026-13-01' }, '2026-02-03')).toThrow(/anchorDate/);
  });
});
