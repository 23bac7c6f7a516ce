import Big from 'big.js';
import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tierCommission } from './tiers.js';
import type { Tier, TierMode } from './types.js';

// Common practice in the trade: commission tiers per pay period such as 40 % / 45 % / 50 %.
const TIERS: Tier[] = [
  { from: new Big('0'), rate: new Big('0.40') },
  { from: new Big('2000'), rate: new Big('0.45') },
  { from: new Big('4000'), rate: new Big('0.50') },
];
const commission = (revenue: string, mode: TierMode, tiers = TIERS) => tierCommission(new Big(revenue), tiers, mode).total.toFixed(2);

describe('tiered commission (common practice in the trade)', () => {
  it('marginal: each band earns its own rate', () => {
    const { rows, total } = tierCommission(new Big('5000.00'), TIERS, 'marginal');
    expect(rows).toEqual([
      { from: '0.00', to: '2000.00', rate: '0.4', base: '2000.00', commission: '800.00' },
      { from: '2000.00', to: '4000.00', rate: '0.45', base: '2000.00', commission: '900.00' },
      { from: '4000.00', to: null, rate: '0.5', base: '1000.00', commission: '500.00' },
    ]);
    expect(total.toFixed(2)).toBe('2200.00');
  });

  it('whole period: all revenue at the rate of the highest tier reached', () => {
    const { rows, total } = tierCommission(new Big('5000.00'), TIERS, 'whole-period');
    expect(rows.map((r) => [r.base, r.commission])).toEqual([
      ['0.00', '0.00'],
      ['0.00', '0.00'],
      ['5000.00', '2500.00'],
    ]);
    expect(total.toFixed(2)).toBe('2500.00');
  });

  it('a threshold belongs to the tier it starts', () => {
    expect(commission('2000.00', 'whole-period')).toBe('900.00');
    expect(commission('1999.99', 'whole-period')).toBe('800.00'); // 799.996
  });

  it('whole period has a cliff at each threshold; marginal does not', () => {
    expect(commission('3999.99', 'whole-period')).toBe('1800.00'); // 1799.9955
    expect(commission('4000.00', 'whole-period')).toBe('2000.00');
    expect(commission('3999.99', 'marginal')).toBe('1700.00'); // 800 + 899.9955
    expect(commission('4000.00', 'marginal')).toBe('1700.00');
  });

  it('below the first threshold both modes agree', () => {
    expect(commission('1234.56', 'marginal')).toBe('493.82');
    expect(commission('1234.56', 'whole-period')).toBe('493.82');
  });

  it('negative commissionable revenue earns the first tier\'s rate, a sum the employer recovers (issue 3, rule 4)', () => {
    for (const mode of ['marginal', 'whole-period'] as const) {
      const { rows, total } = tierCommission(new Big('-250.00'), TIERS, mode);
      expect(total.toFixed(2)).toBe('-100.00');
      expect(rows[0]).toMatchObject({ base: '-250.00', commission: '-100.00' });
      expect(rows[1]).toMatchObject({ base: '0.00', commission: '0.00' });
    }
  });
});

const cents = (max: number) => fc.integer({ min: 1, max }).map((c) => new Big(c).div(100));

/** Increasing thresholds from 0 with rates in [0, 1] to 4 decimals, optionally non-decreasing. */
function tierPlans(rising: boolean, wholeDollars = false) {
  return fc
    .array(fc.tuple(wholeDollars ? fc.integer({ min: 1, max: 5000 }).map((d) => new Big(d)) : cents(500_000), fc.integer({ min: 0, max: 10_000 })), {
      minLength: 1,
      maxLength: 5,
    })
    .map((steps) => {
      const rates = steps.map(([, r]) => r);
      if (rising) rates.sort((a, b) => a - b);
      let from = new Big(0);
      return steps.map(([gap], i) => {
        const tier = { from, rate: new Big(rates[i]!).div(10_000) };
        from = from.plus(gap);
        return tier;
      });
    });
}
const revenue = fc.integer({ min: -100_000, max: 3_000_000 }).map((c) => new Big(c).div(100));

describe('tiered commission properties', () => {
  it('marginal never exceeds whole period for rising rates (property; exact with cent-aligned bands)', () => {
    const wholePercentPlans = tierPlans(true, true).map((tiers) =>
      tiers.map((t) => ({ from: t.from, rate: t.rate.round(2, Big.roundDown) })),
    );
    fc.assert(
      fc.property(wholePercentPlans, revenue, (tiers, r) => {
        const marginal = tierCommission(r, tiers, 'marginal').total;
        const whole = tierCommission(r, tiers, 'whole-period').total;
        expect(marginal.lte(whole)).toBe(true);
      }),
    );
  });

  it('marginal never exceeds whole period by more than the rounding of its bands for any rising plan (property)', () => {
    fc.assert(
      fc.property(tierPlans(true), revenue, (tiers, r) => {
        const marginal = tierCommission(r, tiers, 'marginal').total;
        const whole = tierCommission(r, tiers, 'whole-period').total;
        // each of n rounded bands may gain up to half a cent, the whole-period figure lose up to half a cent
        expect(marginal.lte(whole.plus(new Big('0.005').times(tiers.length + 1)))).toBe(true);
      }),
    );
  });

  it('marginal commission never decreases as revenue rises, whatever the rates (property)', () => {
    fc.assert(
      fc.property(tierPlans(false), revenue, revenue, (tiers, a, b) => {
        const [low, high] = a.lte(b) ? [a, b] : [b, a];
        expect(tierCommission(low, tiers, 'marginal').total.lte(tierCommission(high, tiers, 'marginal').total)).toBe(true);
      }),
    );
  });

  it('agrees with a decimal.js recomputation, bands sum to the revenue, the total to the rows (property)', () => {
    fc.assert(
      fc.property(tierPlans(false), revenue, fc.constantFrom('marginal' as const, 'whole-period' as const), (tiers, r, mode) => {
        const { rows, total } = tierCommission(r, tiers, mode);
        const rev = new Decimal(r.toFixed());
        const froms = tiers.map((t) => new Decimal(t.from.toFixed()));
        let reached = 0;
        froms.forEach((f, i) => {
          if (rev.gte(f)) reached = i;
        });
        const expected = tiers.map((t, i) => {
          const upper = froms[i + 1];
          let base: Decimal;
          if (mode === 'whole-period') base = i === reached ? rev : new Decimal(0);
          else if (i === 0) base = upper ? Decimal.min(rev, upper) : rev;
          else base = Decimal.max(0, (upper ? Decimal.min(rev, upper) : rev).minus(froms[i]!));
          return base.times(t.rate.toFixed()).toDecimalPlaces(2, Decimal.ROUND_HALF_UP);
        });
        expect(rows.map((row) => row.commission)).toEqual(expected.map((c) => c.toFixed(2)));
        expect(rows.reduce((s, row) => s.plus(row.base), new Decimal(0)).eq(rev)).toBe(true);
        expect(rows.reduce((s, row) => s.plus(row.commission), new Decimal(0)).eq(total.toFixed())).toBe(true);
      }),
    );
  });
});
