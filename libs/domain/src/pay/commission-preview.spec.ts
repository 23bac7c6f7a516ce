import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../errors.js';
import { type CommissionSample, commissionPreview } from './commission-preview.js';
import type { PayInput } from './types.js';

// Invented plans in the shape the trade uses (common practice): tiers per pay period, a colour product charge, a retail rate.
const MARGINAL_AT_COST: PayInput['plan'] = {
  tierMode: 'marginal',
  tiers: [
    { from: '0', rate: '0.35' },
    { from: '1500', rate: '0.40' },
    { from: '3000', rate: '0.45' },
  ],
  productCharge: { mode: 'actual-cost', markup: '0.10' },
  retailRate: '0.10',
};
const WHOLE_PERIOD_FIXED: PayInput['plan'] = {
  tierMode: 'whole-period',
  tiers: [
    { from: '0', rate: '0.38' },
    { from: '2500', rate: '0.45' },
  ],
  productCharge: { mode: 'fixed-per-colour-service', value: '12' },
  retailRate: '0',
};
const SAMPLE: CommissionSample = { serviceRevenue: '4000', colourRevenue: '1500', colourServices: 5, colourProductCost: '200', retailSales: '300' };

const money = (value: Decimal) => value.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2);
const refusal = (run: () => unknown): DomainError => {
  try {
    run();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
};

describe('commissionPreview', () => {
  it('marginal tiers on revenue net of the colour product at cost plus markup, and the retail rate', () => {
    const preview = commissionPreview(MARGINAL_AT_COST, SAMPLE);
    // Recomputed with decimal.js: charge = 200 × 1.10; bands 0–1500, 1500–3000, 3000+ of the rest.
    const net = new Decimal('4000').minus(new Decimal('200').times('1.10'));
    const bands = [new Decimal('1500').times('0.35'), new Decimal('1500').times('0.40'), net.minus('3000').times('0.45')].map(money);
    expect(preview.productCharge).toBe(money(new Decimal('200').times('1.10')));
    expect(preview.commissionableRevenue).toBe(money(net));
    expect(preview.tierBreakdown.map((row) => row.commission)).toEqual(bands);
    expect(preview.tierBreakdown.map((row) => row.base)).toEqual(['1500.00', '1500.00', money(net.minus('3000'))]);
    const service = bands.reduce((total, band) => total.plus(band), new Decimal(0));
    expect(preview.serviceCommission).toBe(money(service));
    expect(preview.retailCommission).toBe(money(new Decimal('300').times('0.10')));
    expect(preview.totalCommission).toBe(money(service.plus(preview.retailCommission)));
  });

  it('whole period: a fixed charge per colour service can pull the period under a threshold (the cliff)', () => {
    const above = commissionPreview(WHOLE_PERIOD_FIXED, { ...SAMPLE, serviceRevenue: '2600', colourRevenue: '900', colourServices: 3, retailSales: '0' });
    // decimal.js: 2600 − 3 × 12 = 2564 reaches the 2500 tier, so all of it earns 45 %.
    expect(above.commissionableRevenue).toBe('2564.00');
    expect(above.serviceCommission).toBe(money(new Decimal('2564').times('0.45')));
    const below = commissionPreview(WHOLE_PERIOD_FIXED, { ...SAMPLE, serviceRevenue: '2600', colourRevenue: '900', colourServices: 10, retailSales: '0' });
    // 2600 − 10 × 12 = 2480 stays in the first tier: all of it at 38 %.
    expect(below.commissionableRevenue).toBe('2480.00');
    expect(below.serviceCommission).toBe(money(new Decimal('2480').times('0.38')));
    expect(below.tierBreakdown.map((row) => row.base)).toEqual(['2480.00', '0.00']);
  });

  it('a percentage of price is charged on colour services only, not on the rest of the revenue', () => {
    const plan: PayInput['plan'] = { ...MARGINAL_AT_COST, productCharge: { mode: 'percent-of-price', value: '0.10' } };
    const preview = commissionPreview(plan, { ...SAMPLE, serviceRevenue: '5000', colourRevenue: '1000', colourServices: 4 });
    expect(preview.productCharge).toBe(money(new Decimal('1000').times('0.10')));
  });

  it('spreads colour revenue and cost over the services to the cent, each charge capped at its service price', () => {
    const atCost: PayInput['plan'] = { ...MARGINAL_AT_COST, productCharge: { mode: 'actual-cost' } };
    const split = commissionPreview(atCost, { ...SAMPLE, serviceRevenue: '100', colourRevenue: '100', colourServices: 3, colourProductCost: '10' });
    expect(split.serviceRevenue).toBe('100.00');
    expect(split.productCharge).toBe('10.00');
    // Four services of 5.00 with a fixed 8.00 charge: each charge stops at the price (product-charge.ts), 4 × 5.00.
    const capped = commissionPreview(WHOLE_PERIOD_FIXED, { ...SAMPLE, serviceRevenue: '20', colourRevenue: '20', colourServices: 4, colourProductCost: '0' });
    expect(capped.productCharge).toBe('20.00');
    expect(capped.totalCommission).toBe('0.00');
  });

  it('names the field at fault: the terms first, then the sample', () => {
    const badTier = refusal(() =>
      commissionPreview({ ...MARGINAL_AT_COST, tiers: [{ from: '0', rate: '0.3' }, { from: '0', rate: '0.4' }] }, { ...SAMPLE, colourRevenue: '9999' }),
    );
    expect(badTier.field).toBe('plan.tiers[1].from');
    expect(refusal(() => commissionPreview(MARGINAL_AT_COST, { ...SAMPLE, colourRevenue: '4000.01' })).field).toBe('sample.colourRevenue');
    expect(refusal(() => commissionPreview(MARGINAL_AT_COST, { ...SAMPLE, colourServices: 0 })).field).toBe('sample.colourServices');
    expect(refusal(() => commissionPreview(MARGINAL_AT_COST, { ...SAMPLE, colourServices: 2.5 })).field).toBe('sample.colourServices');
    expect(refusal(() => commissionPreview(MARGINAL_AT_COST, { ...SAMPLE, retailSales: '-1' })).field).toBe('sample.retailSales');
  });
});
