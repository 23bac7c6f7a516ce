import { TZDate } from '@date-fns/tz';
import { addDays as fnsAddDays, addWeeks, differenceInCalendarDays, format, lastDayOfMonth, parseISO, startOfMonth, startOfWeek, subDays } from 'date-fns';
import { describe, expect, it } from 'vitest';
import { businessDateIn } from '../../../lib/business-date';
import { type PayCalendar, daysIn, payPeriodHolding, presetMatching, presetRange, weekStart } from './date-ranges';

// Every expectation below is recomputed with date-fns (and @date-fns/tz), an independent date library,
// rather than written from our own arithmetic.
const ymd = (date: Date): string => format(date, 'yyyy-MM-dd');
const day = (text: string): Date => parseISO(text);

// A spread of todays: month ends, a leap day, year ends, both sides of US daylight-saving changes.
const todays = ['2026-01-01', '2026-02-28', '2028-02-29', '2026-03-08', '2026-03-15', '2026-03-31', '2026-11-01', '2026-12-02', '2026-12-31', '2027-06-16'];

describe('range presets', () => {
  it.each(todays)('month to date and the last 90 days end on %s', (today) => {
    expect(presetRange('month-to-date', today, null)).toEqual({ from: ymd(startOfMonth(day(today))), to: today });
    expect(presetRange('last-90-days', today, null)).toEqual({ from: ymd(subDays(day(today), 89)), to: today });
    expect(daysIn(presetRange('last-90-days', today, null)!)).toBe(differenceInCalendarDays(day(today), subDays(day(today), 89)) + 1);
  });

  it.each(todays)('this week on %s begins on the workweek’s first day, whichever it is', (today) => {
    for (const weekStartsOn of [0, 1, 2, 3, 4, 5, 6] as const) {
      const calendar: PayCalendar = { frequency: 'weekly', anchorDate: '2026-01-05', workweekStartsOn: weekStartsOn };
      expect(presetRange('this-week', today, calendar)).toEqual({ from: ymd(startOfWeek(day(today), { weekStartsOn })), to: today });
      expect(weekStart(today, weekStartsOn)).toBe(ymd(startOfWeek(day(today), { weekStartsOn })));
    }
    // With no pay calendar the week begins on Sunday, date-fns's default too.
    expect(presetRange('this-week', today, null)).toEqual({ from: ymd(startOfWeek(day(today))), to: today });
  });

  it.each(todays)('the last biweekly pay period before %s is the 14 days before the current one', (today) => {
    const calendar: PayCalendar = { frequency: 'biweekly', anchorDate: '2026-01-05', workweekStartsOn: 1 };
    // date-fns walks from the anchor in whole fortnights until the period holding today is found.
    let start = day(calendar.anchorDate);
    while (start > day(today)) start = addWeeks(start, -2);
    while (addWeeks(start, 2) <= day(today)) start = addWeeks(start, 2);
    const previousStart = addWeeks(start, -2);
    expect(presetRange('last-pay-period', today, calendar)).toEqual({ from: ymd(previousStart), to: ymd(fnsAddDays(previousStart, 13)) });
  });

  it.each(todays)('the last weekly pay period before %s', (today) => {
    const calendar: PayCalendar = { frequency: 'weekly', anchorDate: '2026-01-07', workweekStartsOn: 3 };
    const current = startOfWeek(day(today), { weekStartsOn: 3 });
    expect(presetRange('last-pay-period', today, calendar)).toEqual({ from: ymd(subDays(current, 7)), to: ymd(subDays(current, 1)) });
  });

  it.each(todays)('the last semi-monthly pay period before %s is the half month before', (today) => {
    const calendar: PayCalendar = { frequency: 'semi-monthly', anchorDate: '2026-01-01', workweekStartsOn: 0 };
    const date = day(today);
    const expected =
      date.getDate() <= 15
        ? { from: ymd(fnsAddDays(startOfMonth(subDays(startOfMonth(date), 1)), 15)), to: ymd(lastDayOfMonth(subDays(startOfMonth(date), 1))) }
        : { from: ymd(startOfMonth(date)), to: ymd(fnsAddDays(startOfMonth(date), 14)) };
    expect(presetRange('last-pay-period', today, calendar)).toEqual(expected);
  });

  it('knows no last pay period before the pay calendar is set', () => {
    expect(presetRange('last-pay-period', '2026-12-02', null)).toBeNull();
  });

  it('finds a period that holds a date before its anchor', () => {
    const calendar: PayCalendar = { frequency: 'biweekly', anchorDate: '2026-12-14', workweekStartsOn: 1 };
    expect(payPeriodHolding(calendar, '2026-12-01')).toEqual({ from: '2026-11-30', to: '2026-12-13' });
  });

  it('recognises a range that is a preset today, and a custom one', () => {
    expect(presetMatching({ from: '2026-12-01', to: '2026-12-02' }, '2026-12-02', null)).toBe('month-to-date');
    expect(presetMatching({ from: '2026-11-30', to: '2026-12-02' }, '2026-12-02', null)).toBeNull();
  });
});

describe('today in the branch’s time zone', () => {
  // One instant, two business dates: 03:30 UTC on 2 December is still 1 December in Chicago.
  const instant = new Date(Date.UTC(2026, 11, 2, 3, 30));

  it.each(['America/Chicago', 'America/New_York', 'America/Denver', 'Pacific/Auckland', 'Europe/London'])('%s', (timeZone) => {
    const today = businessDateIn(timeZone, instant);
    expect(today).toBe(format(new TZDate(instant, timeZone), 'yyyy-MM-dd'));
    expect(presetRange('month-to-date', today, null)?.from).toBe(format(startOfMonth(new TZDate(instant, timeZone)), 'yyyy-MM-dd'));
  });
});
