import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { amountPer, deriveFigures, feeStatement, shareOf, sumQuantities } from './branch-figures.js';

// Independent arithmetic: decimal.js (npm registry) with half-up rounding, against our big.js code.
const D = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_UP });
const fixed = (value: InstanceType<typeof D>, dp: number) => value.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toFixed(dp).replace(/^-(0\.0+)$/, '$1');
const scaled = (n: number, dp: number) => new D(n).dividedBy(10 ** dp).toFixed(dp);
const money = (min: number, max: number) => fc.integer({ min, max }).map((c) => scaled(c, 2));

describe('branch comparison figures', () => {
  it('shares are part ÷ base to four places, half-up (decimal.js)', () => {
    fc.assert(
      fc.property(money(-1_000_000, 10_000_000), money(1, 10_000_000), (part, base) => {
        expect(shareOf(part, base)).toBe(fixed(new D(part).dividedBy(base), 4));
      }),
    );
  });

  it('has no share where the base is zero or negative', () => {
    expect(shareOf('12.00', '0.00')).toBeNull();
    expect(shareOf('12.00', '-3.00')).toBeNull();
  });

  it('rounds a tie half-up: 1 ÷ 8 = 0.125 → 0.1250, 1 ÷ 16000 = 0.0000625 → 0.0001', () => {
    expect(shareOf('1', '8')).toBe('0.1250');
    expect(shareOf('1', '16000')).toBe('0.0001');
  });

  it('amounts per ticket or hour are to the cent, half-up (decimal.js)', () => {
    fc.assert(
      fc.property(money(-100_000, 50_000_000), fc.integer({ min: 1, max: 100_000 }), (amount, count) => {
        expect(amountPer(amount, String(count))).toBe(fixed(new D(amount).dividedBy(count), 2));
      }),
    );
    expect(amountPer('10.00', '0')).toBeNull();
    // Hours carry three decimals: 100.00 over 7.125 h = 14.0350877… → 14.04.
    expect(amountPer('100.00', '7.125')).toBe('14.04');
  });

  it('derives every ratio from the sums, empty where the base is absent', () => {
    const derived = deriveFigures({
      serviceRevenue: '1000.00',
      retailRevenue: '250.00',
      tickets: 8,
      colourServiceRevenue: '400.00',
      colourProductCost: '37.50',
      hours: '16.000',
      revenueWithHours: '600.00',
      clients: 6,
      rebookedClients: 4,
      commissionCost: null,
      commissionBase: null,
    });
    expect(derived).toEqual({
      averageTicket: '156.25',
      colourCostShare: '0.0938',
      retailToServiceRatio: '0.2500',
      revenuePerStylistHour: '37.50',
      rebookingRate: '0.6667',
      commissionCostShare: null,
    });
  });

  it('a fee statement rounds each fee once and totals the rounded fees (decimal.js)', () => {
    fc.assert(
      fc.property(money(-100_000, 100_000_000), fc.integer({ min: 0, max: 99_999 }), fc.integer({ min: 0, max: 99_999 }), (gross, royalty, marketing) => {
        const royaltyRate = scaled(royalty, 5);
        const marketingFundRate = scaled(marketing, 5);
        const royaltyAmount = fixed(new D(gross).times(royaltyRate), 2);
        const marketingFundAmount = fixed(new D(gross).times(marketingFundRate), 2);
        expect(feeStatement({ grossSales: gross, royaltyRate, marketingFundRate })).toEqual({
          royaltyAmount,
          marketingFundAmount,
          totalFees: fixed(new D(royaltyAmount).plus(marketingFundAmount), 2),
        });
      }),
    );
  });

  it('adds quantities such as hours exactly', () => {
    expect(sumQuantities(['7.125', '0.1', '0.2'], 3)).toBe('7.425');
  });
});
