import Big from 'big.js';
import { describe, expect, it } from 'vitest';
import { parseBusinessDate } from './business-date.js';
import type { WageRules } from './types.js';
import { computeWorkweeks, groupHoursByWeek } from './workweeks.js';

const day = (date: string) => parseBusinessDate(date, 'date');
const entry = (date: string, hours: string) => ({ day: day(date), hours: new Big(hours) });
const FEDERAL: WageRules = {
  minimumWage: new Big('7.25'), // 29 U.S.C. 206(a)(1)(C)
  overtimeAfterHours: new Big('40'), // 29 U.S.C. 207(a)(1)
  overtimeMultiplier: new Big('1.5'),
  workweekStartsOn: 0,
  commissionExemption: false,
};
const week = (start: string, hours: string) => ({ start: day(start), hours: new Big(hours) });

describe('groupHoursByWeek', () => {
  const hours = [entry('2024-03-03', '10'), entry('2024-03-04', '10'), entry('2024-03-05', '10'), entry('2024-03-06', '10'), entry('2024-03-07', '10'), entry('2024-03-09', '5')];

  it('puts each date in the workweek that begins on the configured weekday (29 CFR 778.105: a fixed, recurring 168-hour period)', () => {
    const sundayWeeks = groupHoursByWeek(hours, 0).map((w) => [w.start, w.hours.toFixed()]);
    expect(sundayWeeks).toEqual([[day('2024-03-03'), '55']]);
    const mondayWeeks = groupHoursByWeek(hours, 1).map((w) => [w.start, w.hours.toFixed()]);
    expect(mondayWeeks).toEqual([
      [day('2024-02-26'), '10'],
      [day('2024-03-04'), '45'],
    ]);
  });

  it('lists weeks in order and leaves out a week without hours', () => {
    const weeks = groupHoursByWeek([entry('2024-03-20', '6'), entry('2024-03-05', '0'), entry('2024-03-04', '7.5')], 1);
    expect(weeks.map((w) => [w.start, w.hours.toFixed()])).toEqual([
      [day('2024-03-04'), '7.5'],
      [day('2024-03-18'), '6'],
    ]);
  });
});

describe('computeWorkweeks', () => {
  it('allocates commission equally per hour worked in the period and pays the extra half-time on it (29 CFR 778.120(b), 778.119)', () => {
    const { rows, overtimePremium } = computeWorkweeks([week('2024-03-03', '44'), week('2024-03-10', '36')], new Big('1000.00'), new Big(0), FEDERAL);
    expect(rows.map((r) => [r.earnings, r.regularRate, r.overtimeHours, r.overtimePremium])).toEqual([
      ['550.00', '12.50', '4', '25.00'],
      ['450.00', '12.50', '0', '0.00'],
    ]);
    // The regulation's shorter method, 29 CFR 778.120(a)(2): week's commission × overtime hours ÷ (total hours × 2).
    expect(new Big('550').times(4).div(new Big(44).times(2)).toFixed(2)).toBe(rows[0]!.overtimePremium);
    expect(overtimePremium.toFixed(2)).toBe('25.00');
  });

  it('computes the premium from the exact regular rate, not the rounded one (REFERENCES.md: the DOL advisor\'s cent drifts when steps are rounded)', () => {
    const { rows } = computeWorkweeks([week('2024-03-03', '50')], new Big('617.28'), new Big(0), FEDERAL);
    expect(rows[0]!.regularRate).toBe('12.35'); // 12.3456
    expect(rows[0]!.overtimePremium).toBe('61.73'); // ½ × 12.3456 × 10 = 61.728; from 12.35 it would be 61.75
  });

  it('tops up to the minimum wage for the week\'s hours and pays overtime on the topped-up rate (29 U.S.C. 206, 29 CFR 778.109)', () => {
    const { rows, minimumWageTopUp, overtimePremium } = computeWorkweeks([week('2024-03-03', '44')], new Big('220.00'), new Big(0), FEDERAL);
    expect(rows[0]).toMatchObject({ earnings: '220.00', minimumWageTopUp: '99.00', regularRate: '7.25', overtimePremium: '14.50' });
    expect(minimumWageTopUp.toFixed(2)).toBe('99.00'); // 7.25 × 44 − 220
    expect(overtimePremium.toFixed(2)).toBe('14.50'); // ½ × 7.25 × 4
  });

  it('uses a branch\'s own multiplier and threshold (local law governs)', () => {
    const daily = { ...FEDERAL, overtimeAfterHours: new Big('35'), overtimeMultiplier: new Big('2') };
    const { rows } = computeWorkweeks([week('2024-03-03', '38')], new Big(0), new Big('20'), daily);
    expect(rows[0]).toMatchObject({ overtimeHours: '3', overtimePremium: '60.00', regularRate: '20.00' });
  });

  it('has no workweeks without hours', () => {
    expect(computeWorkweeks([], new Big('500'), new Big(0), FEDERAL).rows).toEqual([]);
  });
});
