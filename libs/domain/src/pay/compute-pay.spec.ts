import { describe, expect, it } from 'vitest';
import { computePay } from './compute-pay.js';
import type { PayInput } from './types.js';

type Plan = PayInput['plan'];
const FEDERAL: PayInput['wageRules'] = {
  minimumWage: '7.25', // 29 U.S.C. 206(a)(1)(C)
  overtimeAfterHours: '40', // 29 U.S.C. 207(a)(1)
  overtimeMultiplier: '1.5',
  workweekStartsOn: 1,
  commissionExemption: false,
};
const FORTY_PERCENT: Plan = { tierMode: 'marginal', tiers: [{ from: '0', rate: '0.40' }], productCharge: { mode: 'none' }, retailRate: '0.10' };

/** One workweek starting Monday 2024-03-04, hours spread over its days. */
function weekOf(total: number): PayInput['hours'] {
  const days = ['2024-03-04', '2024-03-05', '2024-03-06', '2024-03-07', '2024-03-08', '2024-03-09'];
  const hours: PayInput['hours'] = [];
  let left = total;
  for (const date of days) {
    const today = Math.min(left, 10);
    if (today > 0) hours.push({ date, hours: String(today) });
    left -= today;
  }
  return hours;
}

function pay(overrides: Omit<Partial<PayInput>, 'plan'> & { plan?: Partial<Plan> }): ReturnType<typeof computePay> {
  return computePay({
    serviceLines: [],
    retailLines: [],
    tips: [],
    hours: [],
    wageRules: FEDERAL,
    ...overrides,
    plan: { ...FORTY_PERCENT, ...overrides.plan },
  });
}

describe('computePay: the regulation\'s own examples', () => {
  it('29 CFR 778.110(a): $12 an hour for 46 hours is $588 including overtime', () => {
    const result = pay({ plan: { hourlyRate: '12.00' }, hours: weekOf(46) });
    expect(result.workweeks).toEqual([
      {
        start: '2024-03-04',
        hours: '46',
        earnings: '552.00',
        regularRate: '12.00',
        minimumWageTopUp: '0.00',
        overtimeHours: '6',
        overtimePremium: '36.00',
        exempt: false,
      },
    ]);
    expect(result.hourlyPay).toBe('552.00');
    expect(result.grossPay).toBe('588.00');
  });

  it('29 CFR 778.110(b) with 778.117: $46 more for the week (a commission enters the regular rate as the bonus does) makes the rate $13 and pay $637', () => {
    const result = pay({
      plan: { hourlyRate: '12.00' },
      serviceLines: [{ id: 's1', date: '2024-03-05', price: '115.00', isColour: false, productCost: '0' }],
      hours: weekOf(46),
    });
    expect(result.serviceCommission).toBe('46.00');
    expect(result.workweeks[0]).toMatchObject({ earnings: '598.00', regularRate: '13.00', overtimePremium: '39.00' });
    expect(result.grossPay).toBe('637.00');
  });
});

describe('computePay: minimum wage (29 U.S.C. 206) and product charges (29 CFR 531.35)', () => {
  const line = { id: 's1', date: '2024-03-05', price: '800.00', isColour: true, productCost: '150.00' };

  it('tops commission up to the minimum wage for every hour, after the colour product charge (29 CFR 531.35 "free and clear")', () => {
    const result = pay({ plan: { productCharge: { mode: 'actual-cost' } }, serviceLines: [line], hours: weekOf(40) });
    expect(result.commissionableRevenue).toBe('650.00');
    expect(result.serviceCommission).toBe('260.00');
    expect(result.minimumWageTopUp).toBe('30.00'); // 7.25 × 40 − 260
    expect(result.grossPay).toBe('290.00');
  });

  it('needs no top-up when the same work carries no product charge', () => {
    const result = pay({ serviceLines: [line], hours: weekOf(40) });
    expect(result.serviceCommission).toBe('320.00');
    expect(result.minimumWageTopUp).toBe('0.00');
    expect(result.workweeks[0]!.regularRate).toBe('8.00');
  });

  it('lets refunds make commission negative, recovered by the employer, and still pays the minimum wage (issue 3, rule 4; 29 CFR 778.121; 29 U.S.C. 206)', () => {
    const refund = { id: 'r1', date: '2024-03-05', price: '-500.00', isColour: true, productCost: '40.00' };
    const result = pay({ plan: { productCharge: { mode: 'actual-cost' } }, serviceLines: [refund], hours: weekOf(20) });
    expect(result.productCharge).toBe('0.00');
    expect(result.serviceCommission).toBe('-200.00');
    expect(result.workweeks[0]).toMatchObject({ earnings: '-200.00', minimumWageTopUp: '345.00', regularRate: '7.25' });
    expect(result.grossPay).toBe('145.00'); // 7.25 × 20
  });
});

// Booked corrections of the charge are a product rule of ours (common practice: the manager's figure is the
// charge itself, so no markup and no percentage applies to it); the arithmetic is checked by hand.
describe('computePay: product-charge adjustments', () => {
  const colour = { id: 's1', date: '2024-03-05', price: '200.00', isColour: true, productCost: '20.00' };
  const adjustment = (amount: string) => ({ id: 'adjustment:1', date: '2024-03-07', amount });

  it('adds a correction to the charge as booked, without the markup of the plan', () => {
    const result = pay({ plan: { productCharge: { mode: 'actual-cost', markup: '0.10' } }, serviceLines: [colour], productChargeAdjustments: [adjustment('3.40')] });
    expect(result.productCharge).toBe('25.40'); // 20 × 1.10 + 3.40
    expect(result.serviceCommission).toBe('69.84'); // (200 − 25.40) × 40 %
  });

  it('applies a correction under a percentage-of-price rule too, where product cost plays no part', () => {
    const result = pay({ plan: { productCharge: { mode: 'percent-of-price', value: '0.10' } }, serviceLines: [colour], productChargeAdjustments: [adjustment('3.40')] });
    expect(result.productCharge).toBe('23.40'); // 10 % of 200 + 3.40
  });

  it('lets a negative correction take the charge down, never below nothing', () => {
    const plan = { productCharge: { mode: 'actual-cost' } } as const;
    expect(pay({ plan, serviceLines: [colour], productChargeAdjustments: [adjustment('-5.00')] }).productCharge).toBe('15.00');
    expect(pay({ plan, serviceLines: [colour], productChargeAdjustments: [adjustment('-50.00')] }).productCharge).toBe('0.00');
  });

  it('names a bad correction by its path', () => {
    expect(() => pay({ serviceLines: [colour], productChargeAdjustments: [adjustment('3.4.0')] })).toThrow(/productChargeAdjustments\[0\]\.amount/);
  });
});

describe('computePay: tips (29 U.S.C. 203(m)(2)(B), 29 CFR 531.60)', () => {
  it('passes tips through whole and keeps them out of the regular rate, top-up and overtime', () => {
    const without = pay({ plan: { hourlyRate: '7.00' }, hours: weekOf(44) });
    const withTips = pay({ plan: { hourlyRate: '7.00' }, hours: weekOf(44), tips: [{ date: '2024-03-05', amount: '80.00' }, { date: '2024-03-06', amount: '35.50' }] });
    expect(withTips.tips).toBe('115.50');
    expect(withTips.workweeks).toEqual(without.workweeks);
    expect(withTips.workweeks[0]).toMatchObject({ minimumWageTopUp: '11.00', regularRate: '7.25', overtimePremium: '14.50' });
    expect(withTips.grossPay).toBe('449.00'); // 308 + 11 + 14.50 + 115.50
  });
});

describe('computePay: commissioned employees of a retail or service establishment (29 U.S.C. 207(i); 29 CFR 779.410-779.419)', () => {
  const exemption = { ...FEDERAL, commissionExemption: true };
  const retail = (amount: string) => [{ id: 'r1', date: '2024-03-05', amount }];

  it('pays no premium in a week whose regular rate exceeds 1.5 × minimum wage and whose pay is mostly commission', () => {
    const result = pay({ serviceLines: [{ id: 's1', date: '2024-03-05', price: '2500.00', isColour: false, productCost: '0' }], hours: weekOf(46), wageRules: exemption });
    expect(result.workweeks[0]).toMatchObject({ regularRate: '21.74', overtimeHours: '6', overtimePremium: '0.00', exempt: true });
    expect(result.grossPay).toBe('1000.00');
  });

  it('pays the premium when the exemption is not enabled (29 U.S.C. 207(a)(1))', () => {
    const result = pay({ serviceLines: [{ id: 's1', date: '2024-03-05', price: '2500.00', isColour: false, productCost: '0' }], hours: weekOf(46) });
    expect(result.workweeks[0]).toMatchObject({ overtimePremium: '65.22', exempt: false }); // ½ × 1000/46 × 6
  });

  it('needs a rate strictly above 1.5 × $7.25 = $10.875 (29 U.S.C. 207(i)(1))', () => {
    const atLimit = pay({ retailLines: retail('5002.50'), hours: weekOf(46), wageRules: exemption }); // 500.25 / 46 = 10.875
    expect(atLimit.workweeks[0]).toMatchObject({ exempt: false, overtimePremium: '32.63' });
    const above = pay({ retailLines: retail('5002.60'), hours: weekOf(46), wageRules: exemption });
    expect(above.workweeks[0]).toMatchObject({ exempt: true, overtimePremium: '0.00' });
  });

  it('needs commission to be more than half of the week\'s earnings (29 U.S.C. 207(i)(2))', () => {
    const half = pay({ plan: { hourlyRate: '12.00' }, retailLines: retail('5520.00'), hours: weekOf(46), wageRules: exemption });
    expect(half.workweeks[0]).toMatchObject({ regularRate: '24.00', exempt: false, overtimePremium: '72.00' });
    const more = pay({ plan: { hourlyRate: '12.00' }, retailLines: retail('5520.10'), hours: weekOf(46), wageRules: exemption });
    expect(more.workweeks[0]).toMatchObject({ exempt: true, overtimePremium: '0.00' });
  });
});

describe('computePay: the whole sheet', () => {
  it('computes a two-week period with a product charge, an assistant share, a refund, retail and tips, and adds up to the cent', () => {
    const result = computePay({
      plan: {
        tierMode: 'marginal',
        tiers: [
          { from: '0', rate: '0.40' },
          { from: '1000', rate: '0.50' },
        ],
        productCharge: { mode: 'actual-cost', markup: '0.10' },
        retailRate: '0.10',
      },
      serviceLines: [
        { id: 'a', date: '2024-03-04', price: '1200.00', isColour: true, productCost: '50.00' },
        { id: 'b', date: '2024-03-06', price: '300.00', isColour: true, productCost: '40.00', share: '0.5' },
        { id: 'c', date: '2024-03-12', price: '80.00', isColour: false, productCost: '0' },
        { id: 'd', date: '2024-03-14', price: '-80.00', isColour: false, productCost: '0' },
      ],
      retailLines: [
        { id: 'r1', date: '2024-03-05', amount: '120.00' },
        { id: 'r2', date: '2024-03-13', amount: '45.50' },
      ],
      tips: [
        { date: '2024-03-04', amount: '40.00' },
        { date: '2024-03-12', amount: '25.50' },
      ],
      hours: [...weekOf(42), { date: '2024-03-11', hours: '10' }, { date: '2024-03-12', hours: '10' }, { date: '2024-03-13', hours: '10' }],
      wageRules: FEDERAL,
    });
    expect(result).toEqual({
      serviceRevenue: '1350.00', // 1200 + 150 + 80 − 80
      productCharge: '77.00', // 55 + 22; no charge on the refund
      commissionableRevenue: '1273.00',
      tierBreakdown: [
        { from: '0.00', to: '1000.00', rate: '0.4', base: '1000.00', commission: '400.00' },
        { from: '1000.00', to: null, rate: '0.5', base: '273.00', commission: '136.50' },
      ],
      serviceCommission: '536.50',
      retailCommission: '16.55',
      hourlyPay: '0.00',
      tips: '65.50',
      workweeks: [
        // 553.05 of commission over 72 hours = 7.68125 an hour (29 CFR 778.120(b))
        { start: '2024-03-04', hours: '42', earnings: '322.61', regularRate: '7.68', minimumWageTopUp: '0.00', overtimeHours: '2', overtimePremium: '7.68', exempt: false },
        { start: '2024-03-11', hours: '30', earnings: '230.44', regularRate: '7.68', minimumWageTopUp: '0.00', overtimeHours: '0', overtimePremium: '0.00', exempt: false },
      ],
      minimumWageTopUp: '0.00',
      overtimePremium: '7.68',
      grossPay: '626.23',
    });
  });

  it('pays commission without hours and then lists no workweeks (issue 3, rule 6)', () => {
    const result = pay({ serviceLines: [{ id: 's1', date: '2024-03-05', price: '200.00', isColour: false, productCost: '0' }] });
    expect(result.workweeks).toEqual([]);
    expect(result.grossPay).toBe('80.00');
  });

  it('counts overtime in the configured workweek: the same days give different overtime from Sunday or Monday (29 CFR 778.104, 778.105)', () => {
    const hours = [
      { date: '2024-03-03', hours: '10' },
      ...['2024-03-04', '2024-03-05', '2024-03-06', '2024-03-07'].map((date) => ({ date, hours: '10' })),
      { date: '2024-03-09', hours: '5' },
    ];
    const fromSunday = pay({ plan: { hourlyRate: '20.00' }, hours, wageRules: { ...FEDERAL, workweekStartsOn: 0 } });
    const fromMonday = pay({ plan: { hourlyRate: '20.00' }, hours, wageRules: { ...FEDERAL, workweekStartsOn: 1 } });
    expect(fromSunday.workweeks.map((w) => [w.start, w.overtimeHours])).toEqual([['2024-03-03', '15']]);
    expect(fromMonday.workweeks.map((w) => [w.start, w.overtimeHours])).toEqual([
      ['2024-02-26', '0'],
      ['2024-03-04', '5'],
    ]);
    expect(fromSunday.overtimePremium).toBe('150.00');
    expect(fromMonday.overtimePremium).toBe('50.00');
  });

  it('throws a DomainError naming the bad field (issue 3, rule 8)', () => {
    expect(() => pay({ plan: { tiers: [{ from: '0', rate: '0.4' }, { from: '0', rate: '0.5' }] } })).toThrow(
      expect.objectContaining({ name: 'DomainError', code: 'pay.invalid_tiers', field: 'plan.tiers[1].from' }),
    );
    expect(() => pay({ serviceLines: [{ id: 'x', date: '2024-03-05', price: '12,50', isColour: false, productCost: '0' }] })).toThrow(
      expect.objectContaining({ field: 'serviceLines[0].price' }),
    );
  });
});
