import { addDays, differenceInCalendarDays, format, parseISO } from 'date-fns';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { patchTestStatus } from './patch-test.js';

describe('patchTestStatus', () => {
  it('is "none" without a test on record', () => {
    expect(patchTestStatus({ lastPatchTestOn: null, onDate: '2026-05-10', maxAgeDays: 180 })).toEqual({ status: 'none', ageDays: null, validUntil: null });
  });

  // Common practice in salons, after US FDA consumer guidance on hair dyes (from memory): a patch test
  // 48 hours before colour. With dates only, a test two calendar days before the service is the first that counts.
  it('is "too-recent" the same day and the day after the test, "current" from the second day', () => {
    const on = (onDate: string) => patchTestStatus({ lastPatchTestOn: '2026-05-10', onDate, maxAgeDays: 180 });
    expect(on('2026-05-10')).toEqual({ status: 'too-recent', ageDays: 0, validUntil: '2026-11-06' });
    expect(on('2026-05-11')).toEqual({ status: 'too-recent', ageDays: 1, validUntil: '2026-11-06' });
    expect(on('2026-05-12')).toEqual({ status: 'current', ageDays: 2, validUntil: '2026-11-06' });
  });

  it('gives no cover for a service before the test was done', () => {
    expect(patchTestStatus({ lastPatchTestOn: '2026-05-10', onDate: '2026-05-01', maxAgeDays: 180 })).toMatchObject({ status: 'too-recent', ageDays: -9 });
  });

  it('stays current up to and including maxAgeDays, and expires the day after validUntil', () => {
    // 2024-01-01 + 180 days = 2024-06-29 (2024 is a leap year: 31+29+31+30+31+29 = 181 days to 2024-06-30).
    expect(patchTestStatus({ lastPatchTestOn: '2024-01-01', onDate: '2024-06-29', maxAgeDays: 180 })).toEqual({
      status: 'current',
      ageDays: 180,
      validUntil: '2024-06-29',
    });
    expect(patchTestStatus({ lastPatchTestOn: '2024-01-01', onDate: '2024-06-30', maxAgeDays: 180 })).toEqual({
      status: 'expired',
      ageDays: 181,
      validUntil: '2024-06-29',
    });
  });

  it('counts across month ends, leap days and the new year', () => {
    expect(patchTestStatus({ lastPatchTestOn: '2023-12-30', onDate: '2024-03-01', maxAgeDays: 60 })).toEqual({
      status: 'expired',
      ageDays: 62, // 2 (Dec) + 31 (Jan) + 29 (Feb 2024) = 62
      validUntil: '2024-02-28',
    });
  });

  it('agrees with date-fns calendar-day arithmetic for any pair of dates (property)', () => {
    const day = fc.integer({ min: 0, max: 60_000 }).map((n) => format(addDays(parseISO('1900-01-01'), n), 'yyyy-MM-dd'));
    fc.assert(
      fc.property(day, day, fc.integer({ min: 0, max: 3650 }), (lastPatchTestOn, onDate, maxAgeDays) => {
        const ageDays = differenceInCalendarDays(parseISO(onDate), parseISO(lastPatchTestOn));
        const expected = ageDays < 2 ? 'too-recent' : ageDays > maxAgeDays ? 'expired' : 'current';
        expect(patchTestStatus({ lastPatchTestOn, onDate, maxAgeDays })).toEqual({
          status: expected,
          ageDays,
          validUntil: format(addDays(parseISO(lastPatchTestOn), maxAgeDays), 'yyyy-MM-dd'),
        });
      }),
    );
  });

  it.each([
    [{ lastPatchTestOn: '2026-02-30', onDate: '2026-05-10', maxAgeDays: 180 }, 'lastPatchTestOn'],
    [{ lastPatchTestOn: '10/05/2026', onDate: '2026-05-10', maxAgeDays: 180 }, 'lastPatchTestOn'],
    [{ lastPatchTestOn: undefined, onDate: '2026-05-10', maxAgeDays: 180 }, 'lastPatchTestOn'],
    [{ lastPatchTestOn: '2026-05-01', onDate: '2026-05-10T09:00:00Z', maxAgeDays: 180 }, 'onDate'],
    [{ lastPatchTestOn: '2026-05-01', onDate: '2026-05-10', maxAgeDays: -1 }, 'maxAgeDays'],
    [{ lastPatchTestOn: '2026-05-01', onDate: '2026-05-10', maxAgeDays: 1.5 }, 'maxAgeDays'],
    [{ lastPatchTestOn: '2026-05-01', onDate: '2026-05-10', maxAgeDays: '180' }, 'maxAgeDays'],
  ])('refuses %j naming %s', (input, field) => {
    expect(() => patchTestStatus(input as any)).toThrow(expect.objectContaining({ name: 'DomainError', code: 'domain.invalid_input', field }));
  });
});
