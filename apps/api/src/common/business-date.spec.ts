import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { businessDateIn, businessDayBounds } from './business-date.js';

// Checked against date-fns with @date-fns/tz, a reference library independent of our Intl use.
describe('businessDateIn', () => {
  const instants = ['2026-03-08T07:59:59Z', '2026-03-08T08:00:00Z', '2026-11-01T05:30:00Z', '2026-12-31T23:30:00Z', '2027-01-01T04:59:00Z'];
  const zones = ['America/Chicago', 'America/New_York', 'America/Denver', 'America/Los_Angeles', 'Pacific/Honolulu', 'UTC'];

  it.each(zones)('gives the local calendar date in %s, across clock changes and the new year', (zone) => {
    for (const iso of instants) {
      const instant = new Date(iso);
      expect(businessDateIn(zone, instant)).toBe(format(new TZDate(instant, zone), 'yyyy-MM-dd'));
    }
  });

  it('puts 11:30 pm on New Year’s Eve in Chicago on the 31st although it is already the 1st in UTC', () => {
    expect(businessDateIn('America/Chicago', new Date('2027-01-01T05:30:00Z'))).toBe('2026-12-31');
  });
});

describe('businessDayBounds', () => {
  it('spans 23 hours on the spring-forward day and 25 on the fall-back day in Chicago (US daylight saving time, 15 U.S.C. 260a — citation from memory)', () => {
    const spring = businessDayBounds('America/Chicago', '2026-03-08');
    expect(spring.from.toISOString()).toBe('2026-03-08T06:00:00.000Z');
    expect(spring.to.getTime() - spring.from.getTime()).toBe(23 * 3_600_000);
    const fall = businessDayBounds('America/Chicago', '2026-11-01');
    expect(fall.to.getTime() - fall.from.getTime()).toBe(25 * 3_600_000);
  });

  it('ends where the next business date begins', () => {
    expect(businessDayBounds('America/New_York', '2026-12-31').to).toEqual(businessDayBounds('America/New_York', '2027-01-01').from);
  });
});
