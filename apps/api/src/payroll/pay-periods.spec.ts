import { isPeriodStart, payPeriodAfter, payPeriodContaining } from './pay-periods.js';

// Pay-period calendars are common practice in US payroll: weekly (52 a year), biweekly (every other
// week, 26 a year) and semi-monthly (the 1st–15th and the 16th–last day, 24 a year).
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
});
