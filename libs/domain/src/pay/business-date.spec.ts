import { TZDate } from '@date-fns/tz';
import { addDays, format, getDay, startOfWeek } from 'date-fns';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatBusinessDate, parseBusinessDate, weekdayOf, workweekStart } from './business-date.js';

type WeekStartsOn = 0 | 1 | 2 | 3 | 4 | 5 | 6;
const ZONES = ['America/New_York', 'America/Los_Angeles', 'Europe/London', 'Australia/Lord_Howe', 'UTC'];
const EPOCH = parseBusinessDate('1970-01-01', 'date');

/** The same business date as a local date in a branch's time zone, at noon so DST shifts cannot move the day. */
function zoned(days: number, zone: string): TZDate {
  return addDays(new TZDate(1970, 0, 1, 12, 0, 0, zone), days);
}

describe('business dates', () => {
  it('counts days from 1970-01-01 and accepts leap days where the Gregorian calendar has them', () => {
    expect(EPOCH).toBe(0);
    expect(parseBusinessDate('2024-02-29', 'date') - parseBusinessDate('2024-02-28', 'date')).toBe(1);
    expect(parseBusinessDate('2000-02-29', 'date')).toBe(parseBusinessDate('2000-03-01', 'date') - 1);
  });

  it.each(['2023-02-29', '1900-02-29', '2024-13-01', '2024-04-31', '2024-1-05', '24-01-05', '2024-01-05T00:00', ''])(
    'refuses %j with the field path',
    (text) => {
      expect(() => parseBusinessDate(text, 'hours[2].date')).toThrow(
        expect.objectContaining({ code: 'domain.invalid_input', field: 'hours[2].date' }),
      );
    },
  );

  it('formats and weekdays every day as date-fns does in a branch time zone (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -25_000, max: 50_000 }), fc.constantFrom(...ZONES), (days, zone) => {
        const local = zoned(days, zone);
        expect(formatBusinessDate(days)).toBe(format(local, 'yyyy-MM-dd'));
        expect(parseBusinessDate(format(local, 'yyyy-MM-dd'), 'date')).toBe(days);
        expect(weekdayOf(days)).toBe(getDay(local));
      }),
    );
  });
});

describe('workweekStart', () => {
  it('starts the week on the configured weekday', () => {
    const wednesday = parseBusinessDate('2024-03-06', 'date');
    expect(formatBusinessDate(workweekStart(wednesday, 0))).toBe('2024-03-03');
    expect(formatBusinessDate(workweekStart(wednesday, 1))).toBe('2024-03-04');
    expect(formatBusinessDate(workweekStart(wednesday, 3))).toBe('2024-03-06');
    expect(formatBusinessDate(workweekStart(wednesday, 4))).toBe('2024-02-29');
  });

  it('matches date-fns startOfWeek in the branch time zone, across DST changes (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -25_000, max: 50_000 }),
        fc.integer({ min: 0, max: 6 }),
        fc.constantFrom(...ZONES),
        (days, startsOn, zone) => {
          const expected = format(startOfWeek(zoned(days, zone), { weekStartsOn: startsOn as WeekStartsOn }), 'yyyy-MM-dd');
          expect(formatBusinessDate(workweekStart(days, startsOn))).toBe(expected);
        },
      ),
    );
  });
});
