import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tierProgress } from './tier-progress.js';
import type { TierMode } from './types.js';

// Common practice in the trade: tiers per pay period such as 40 % / 45 % / 50 %; these thresholds are invented.
const TIERS = [
  { from: '0', rate: '0.40' },
  { from: '2000', rate: '0.45' },
  { from: '4000', rate: '0.50' },
];
const progress = (commissionableRevenue: string, tierMode: TierMode, tiers = TIERS) => tierProgress({ tierMode, tiers, commissionableRevenue });

describe('progress to the next commission tier (worked examples, common practice tiers)', () => {
  it('marginal: the revenue still needed earns the current rate, nothing more', () => {
    // 1500 at 40 % = 600; at 2000: 800; 500 more adds 500 × 0.40 = 200.
    expect(progress('1500.00', 'marginal')).toEqual({
      currentTier: { index: 0, from: '0.00', to: '2000.00', rate: '0.4' },
      nextTier: { index: 1, from: '2000.00', rate: '0.45' },
      revenueToNextTier: '500.00',
      commission: '600.00',
      commissionAtNextTier: '800.00',
      commissionAdded: '200.00',
      progress: '0.75',
    });
  });

  it('whole period: reaching the threshold lifts the rate on everything (the cliff)', () => {
    // 1500 × 0.40 = 600; 2000 × 0.45 = 900: 300 added = 500 × 0.40 + 2000 × (0.45 − 0.40).
    expect(progress('1500.00', 'whole-period')).toMatchObject({
      revenueToNextTier: '500.00',
      commission: '600.00',
      commissionAtNextTier: '900.00',
      commissionAdded: '300.00',
      progress: '0.75',
    });
  });

  it('one cent short of the top tier', () => {
    // Whole period: 3999.99 × 0.45 = 1799.9955 → 1800.00; 4000 × 0.50 = 2000.00.
    expect(progress('3999.99', 'whole-period')).toMatchObject({
      currentTier: { index: 1, from: '2000.00', to: '4000.00', rate: '0.45' },
      nextTier: { index: 2, from: '4000.00', rate: '0.5' },
      revenueToNextTier: '0.01',
      commissionAdded: '200.00',
      progress: '0.9999',
    });
    // Marginal: 800 + 1999.99 × 0.45 (899.9955 → 900.00) = 1700.00, the same as at 4000: the cent adds nothing once rounded.
    expect(progress('3999.99', 'marginal')).toMatchObject({ revenueToNextTier: '0.01', commission: '1700.00', commissionAtNextTier: '1700.00', commissionAdded: '0.00' });
  });

  it('a threshold belongs to the tier it starts', () => {
    expect(progress('2000.00', 'marginal')).toMatchObject({
      currentTier: { index: 1, from: '2000.00', to: '4000.00', rate: '0.45' },
      revenueToNextTier: '2000.00',
      commissionAdded: '900.00',
      progress: '0',
    });
  });

  it('on the top tier there is no next tier', () => {
    expect(progress('5000.00', 'marginal')).toEqual({
      currentTier: { index: 2, from: '4000.00', to: null, rate: '0.5' },
      nextTier: null,
      revenueToNextTier: null,
      commission: '2200.00',
      commissionAtNextTier: null,
      commissionAdded: null,
      progress: '1',
    });
    expect(progress('0.00', 'whole-period', [{ from: '0', rate: '0.42' }])).toMatchObject({ nextTier: null, commission: '0.00', progress: '1' });
  });

  it('refunds outweighing sales stay in the first tier, at no progress', () => {
    // -250 × 0.40 = -100; at 2000: 800, so 2250 more adds 900.
    expect(progress('-250.00', 'marginal')).toMatchObject({
      currentTier: { index: 0 },
      revenueToNextTier: '2250.00',
      commission: '-100.00',
      commissionAdded: '900.00',
      progress: '0',
    });
  });

  it('names the bad field', () => {
    expect(() => progress('12', 'marginal', [{ from: '100', rate: '0.4' }])).toThrow(expect.objectContaining({ code: 'pay.invalid_tiers', field: 'tiers[0].from' }));
    expect(() => progress('12', 'marginal', [...TIERS, { from: '3000', rate: '0.6' }])).toThrow(expect.objectContaining({ field: 'tiers[3].from' }));
    expect(() => progress('12', 'marginal', [])).toThrow(expect.objectContaining({ field: 'tiers' }));
    expect(() => progress('12', 'marginal', [{ from: '0', rate: '1.2' }])).toThrow(expect.objectContaining({ field: 'tiers[0].rate' }));
    expect(() => progress('twelve', 'marginal')).toThrow(expect.objectContaining({ field: 'commissionableRevenue' }));
    expect(() => progress('12', 'flat' as TierMode)).toThrow(expect.objectContaining({ field: 'tierMode' }));
  });
});

// An independent model on decimal.js: tiered commission band by band, each band rounded half-up to the cent.
const D = Decimal.clone({ precision: 60 });
const cents = (n: number) => new D(n).div(100).toFixed(2);
const round = (value: Decimal) => value.toDecimalPlaces(2, Decimal.ROUND_HALF_UP);

function modelCommission(revenue: Decimal, tiers: { from: Decimal; rate: Decimal }[], mode: TierMode): Decimal {
  let reached = 0;
  tiers.forEach((tier, i) => {
    if (revenue.gte(tier.from)) reached = i;
  });
  return tiers.reduce((total, tier, i) => {
    const upper = tiers[i + 1]?.from;
    let base: Decimal;
    if (mode === 'whole-period') base = i === reached ? revenue : new D(0);
    else if (i === 0) base = upper && revenue.gt(upper) ? upper : revenue;
    else base = D.max(0, (upper && revenue.gt(upper) ? upper : revenue).minus(tier.from));
    return total.plus(round(base.times(tier.rate)));
  }, new D(0));
}

const plans = fc
  .array(fc.tuple(fc.integer({ min: 1, max: 500_000 }), fc.integer({ min: 0, max: 10_000 })), { minLength: 1, maxLength: 5 })
  .map((steps) => {
    let from = 0;
    return steps.map(([gap, rate]) => {
      const tier = { from: cents(from), rate: new D(rate).div(10_000).toFixed() };
      from += gap;
      return tier;
    });
  });
const revenues = fc.integer({ min: -100_000, max: 3_000_000 }).map(cents);
const modes = fc.constantFrom<TierMode>('marginal', 'whole-period');

describe('progress to the next tier (property, recomputed with decimal.js)', () => {
  it('agrees with the model: tier reached, revenue needed, commission now and at the threshold', () => {
    fc.assert(
      fc.property(plans, revenues, modes, (tiers, revenue, mode) => {
        const result = tierProgress({ tierMode: mode, tiers, commissionableRevenue: revenue });
        const r = new D(revenue);
        const model = tiers.map((t) => ({ from: new D(t.from), rate: new D(t.rate) }));
        const index = model.reduce((reached, t, i) => (r.gte(t.from) ? i : reached), 0);
        const now = modelCommission(r, model, mode);
        expect(result.currentTier.index).toBe(index);
        expect(result.commission).toBe(now.toFixed(2));
        const next = model[index + 1];
        if (!next) {
          expect(result.nextTier).toBeNull();
          expect(result.progress).toBe('1');
          return;
        }
        const atNext = modelCommission(next.from, model, mode);
        expect(result.revenueToNextTier).toBe(next.from.minus(r).toFixed(2));
        expect(result.commissionAtNextTier).toBe(atNext.toFixed(2));
        expect(result.commissionAdded).toBe(atNext.minus(now).toFixed(2));
        const through = D.max(0, r.minus(model[index]!.from)).div(next.from.minus(model[index]!.from));
        expect(result.progress).toBe(through.toDecimalPlaces(4, Decimal.ROUND_DOWN).toFixed());
        expect(new D(result.progress).lt(1)).toBe(true);
      }),
    );
  });

  it('marginal adds the current rate on the revenue needed; whole period adds the rate lift on all of it as well', () => {
    fc.assert(
      fc.property(plans, revenues, modes, (tiers, revenue, mode) => {
        const result = tierProgress({ tierMode: mode, tiers, commissionableRevenue: revenue });
        if (!result.nextTier) return;
        const r = new D(revenue);
        const threshold = new D(result.nextTier.from);
        const rate = new D(result.currentTier.rate);
        const exact =
          mode === 'marginal'
            ? threshold.minus(r).times(rate)
            : threshold.minus(r).times(rate).plus(threshold.times(new D(result.nextTier.rate).minus(rate)));
        // Each side is a sum of bands rounded to the cent: at most half a cent per band apart from the exact figure.
        const slack = new D('0.005').times(tiers.length * 2);
        expect(new D(result.commissionAdded!).minus(exact).abs().lte(slack)).toBe(true);
      }),
    );
  });
});
