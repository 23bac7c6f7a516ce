import { TZDate } from '@date-fns/tz';
import { addDays, format, startOfWeek } from 'date-fns';
import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computePay } from './compute-pay.js';
import type { PayInput, PayResult } from './types.js';

// An independent model of issue 3's rules: decimal.js for the figures, date-fns for the workweeks.
const D = Decimal.clone({ precision: 80, rounding: Decimal.ROUND_HALF_UP });
type Dec = InstanceType<typeof D>;
const money = (value: Dec) => value.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2).replace(/^-(0\.00)$/, '$1');
const add = (values: Dec[]) => values.reduce((a, b) => a.plus(b), new D(0));
const max0 = (value: Dec) => (value.isNegative() ? new D(0) : value);

function scaled(n: number, dp: number): string {
  const digits = Math.abs(n).toString().padStart(dp + 1, '0');
  const text = dp === 0 ? digits : `${digits.slice(0, -dp)}.${digits.slice(-dp)}`;
  return n < 0 ? `-${text}` : text;
}
const moneyArb = (min: number, max: number) => fc.integer({ min, max }).map((c) => scaled(c, 2));
const fraction = (dp: number) => fc.integer({ min: 0, max: 10 ** dp }).map((n) => scaled(n, dp));
const dateArb = fc.integer({ min: 0, max: 27 }).map((n) => format(addDays(new TZDate(2024, 2, 1, 12, 0, 0, 'UTC'), n), 'yyyy-MM-dd'));

const tiersArb = fc
  .array(fc.tuple(fc.integer({ min: 1, max: 300_000 }), fraction(4)), { minLength: 1, maxLength: 4 })
  .map((steps) => {
    let from = 0;
    return steps.map(([gap, rate]) => {
      const tier = { from: scaled(from, 2), rate };
      from += gap;
      return tier;
    });
  });

const productChargeArb: fc.Arbitrary<PayInput['plan']['productCharge']> = fc.oneof(
  fc.constant({ mode: 'none' as const }),
  fc.option(fraction(2), { nil: undefined }).map((markup) => (markup === undefined ? { mode: 'actual-cost' as const } : { mode: 'actual-cost' as const, markup })),
  fraction(2).map((value) => ({ mode: 'percent-of-price' as const, value })),
  moneyArb(0, 5_000).map((value) => ({ mode: 'fixed-per-colour-service' as const, value })),
);

const payInputArb: fc.Arbitrary<PayInput> = fc.record({
  plan: fc.record({
    tierMode: fc.constantFrom('marginal' as const, 'whole-period' as const),
    tiers: tiersArb,
    productCharge: productChargeArb,
    retailRate: fraction(3),
    hourlyRate: fc.option(moneyArb(0, 3_000), { nil: undefined }),
  }, { requiredKeys: ['tierMode', 'tiers', 'productCharge', 'retailRate'] }),
  serviceLines: fc.array(
    fc.record(
      {
        id: fc.uuid(),
        date: dateArb,
        price: moneyArb(-50_000, 200_000),
        isColour: fc.boolean(),
        productCost: moneyArb(0, 10_000),
        share: fraction(3),
      },
      { requiredKeys: ['id', 'date', 'price', 'isColour', 'productCost'] },
    ),
    { maxLength: 12 },
  ),
  retailLines: fc.array(fc.record({ id: fc.uuid(), date: dateArb, amount: moneyArb(-5_000, 50_000) }), { maxLength: 5 }),
  tips: fc.array(fc.record({ date: dateArb, amount: moneyArb(0, 20_000) }), { maxLength: 5 }),
  hours: fc
    .uniqueArray(fc.tuple(dateArb, fc.integer({ min: 0, max: 96 })), { selector: ([date]) => date, maxLength: 24 })
    .map((days) => days.map(([date, quarters]) => ({ date, hours: scaled(quarters * 25, 2) }))),
  wageRules: fc.record({
    minimumWage: moneyArb(0, 2_000),
    overtimeAfterHours: fc.constantFrom('40', '35', '0', '12.5'),
    overtimeMultiplier: fc.constantFrom('1.5', '2', '1'),
    workweekStartsOn: fc.constantFrom(0 as const, 1 as const, 2 as const, 3 as const, 4 as const, 5 as const, 6 as const),
    commissionExemption: fc.boolean(),
  }),
});

function model(input: PayInput): PayResult {
  const { plan, wageRules: rules } = input;
  const pc = plan.productCharge;
  const lines = input.serviceLines.map((line) => {
    const price = new D(line.price);
    const share = new D(line.share ?? '1');
    let charge = new D(0);
    if (price.gt(0)) {
      if (pc.mode === 'actual-cost') charge = new D(line.productCost).times(new D(pc.markup ?? '0').plus(1));
      if (pc.mode === 'percent-of-price' && line.isColour) charge = price.times(pc.value!);
      if (pc.mode === 'fixed-per-colour-service' && line.isColour) charge = new D(pc.value!);
      charge = D.min(charge, price);
    }
    return { revenue: price.times(share), charge: charge.times(share) };
  });
  const serviceRevenue = new D(money(add(lines.map((l) => l.revenue))));
  const productCharge = new D(money(add(lines.map((l) => l.charge))));
  const commissionable = serviceRevenue.minus(productCharge);

  const froms = plan.tiers.map((t) => new D(t.from));
  const reached = froms.reduce((best, from, i) => (commissionable.gte(from) ? i : best), 0);
  const tierBreakdown = plan.tiers.map((tier, i) => {
    const upper = froms[i + 1];
    const capped = upper && commissionable.gt(upper) ? upper : commissionable;
    let base: Dec;
    if (plan.tierMode === 'whole-period') base = i === reached ? commissionable : new D(0);
    else base = i === 0 ? capped : max0(capped.minus(froms[i]!));
    return {
      from: froms[i]!.toFixed(2),
      to: upper ? upper.toFixed(2) : null,
      rate: new D(tier.rate).toString(),
      base: money(base),
      commission: money(base.times(tier.rate)),
    };
  });
  const serviceCommission = add(tierBreakdown.map((t) => new D(t.commission)));
  const retailCommission = new D(money(add(input.retailLines.map((l) => new D(l.amount))).times(plan.retailRate)));
  const tips = new D(money(add(input.tips.map((t) => new D(t.amount)))));
  const hourlyRate = new D(plan.hourlyRate ?? '0');
  const hourlyPay = new D(money(add(input.hours.map((h) => new D(h.hours))).times(hourlyRate)));

  const byWeek = new Map<string, Dec>();
  for (const entry of input.hours) {
    const [y, m, d] = entry.date.split('-').map(Number) as [number, number, number];
    const start = format(startOfWeek(new TZDate(y, m - 1, d, 12, 0, 0, 'UTC'), { weekStartsOn: rules.workweekStartsOn }), 'yyyy-MM-dd');
    byWeek.set(start, (byWeek.get(start) ?? new D(0)).plus(entry.hours));
  }
  const weeks = [...byWeek.entries()].filter(([, h]) => h.gt(0)).sort(([a], [b]) => a.localeCompare(b));
  const H = add(weeks.map(([, h]) => h));
  const C = serviceCommission.plus(retailCommission);
  const mw = new D(rules.minimumWage);
  // Figures are kept multiplied by H (the period's hours) so that each one is a single exact division.
  const workweeks = weeks.map(([start, h]) => {
    const commissionH = C.times(h);
    const earningsH = hourlyRate.times(h).times(H).plus(commissionH);
    const topUpH = max0(mw.times(h).times(H).minus(earningsH));
    const rateHh = earningsH.plus(topUpH); // regular rate × H × h
    const overtime = max0(h.minus(rules.overtimeAfterHours));
    const exempt = rules.commissionExemption && rateHh.gt(mw.times('1.5').times(H).times(h)) && commissionH.gt(earningsH.div(2));
    const premium = exempt ? new D(0) : new D(rules.overtimeMultiplier).minus(1).times(rateHh).times(overtime).div(H.times(h));
    return {
      start,
      hours: h.toString(),
      earnings: money(earningsH.div(H)),
      regularRate: money(rateHh.div(H.times(h))),
      minimumWageTopUp: money(topUpH.div(H)),
      overtimeHours: overtime.toString(),
      overtimePremium: money(premium),
      exempt,
    };
  });
  const minimumWageTopUp = add(workweeks.map((w) => new D(w.minimumWageTopUp)));
  const overtimePremium = add(workweeks.map((w) => new D(w.overtimePremium)));
  return {
    serviceRevenue: money(serviceRevenue),
    productCharge: money(productCharge),
    commissionableRevenue: money(commissionable),
    tierBreakdown,
    serviceCommission: money(serviceCommission),
    retailCommission: money(retailCommission),
    hourlyPay: money(hourlyPay),
    tips: money(tips),
    workweeks,
    minimumWageTopUp: money(minimumWageTopUp),
    overtimePremium: money(overtimePremium),
    grossPay: money(add([serviceCommission, retailCommission, hourlyPay, tips, minimumWageTopUp, overtimePremium])),
  };
}

describe('computePay properties', () => {
  it('grossPay is the sum of its rounded parts, and each total the sum of its rows (property)', () => {
    fc.assert(
      fc.property(payInputArb, (input) => {
        const r = computePay(input);
        const parts = [r.serviceCommission, r.retailCommission, r.hourlyPay, r.tips, r.minimumWageTopUp, r.overtimePremium];
        expect(new D(r.grossPay).eq(add(parts.map((p) => new D(p))))).toBe(true);
        expect(new D(r.minimumWageTopUp).eq(add(r.workweeks.map((w) => new D(w.minimumWageTopUp))))).toBe(true);
        expect(new D(r.overtimePremium).eq(add(r.workweeks.map((w) => new D(w.overtimePremium))))).toBe(true);
        expect(new D(r.serviceCommission).eq(add(r.tierBreakdown.map((t) => new D(t.commission))))).toBe(true);
        expect(new D(r.commissionableRevenue).eq(new D(r.serviceRevenue).minus(r.productCharge))).toBe(true);
        for (const figure of [...parts, r.grossPay, r.serviceRevenue, r.productCharge]) expect(figure).toMatch(/^-?\d+\.\d{2}$/);
      }),
    );
  });

  it('agrees figure for figure with an independent decimal.js and date-fns model of the rules (property)', () => {
    fc.assert(
      fc.property(payInputArb, (input) => {
        expect(computePay(input)).toEqual(model(input));
      }),
      { numRuns: 300 },
    );
  });

  it('never pays less than the minimum wage for the hours worked, before tips (29 U.S.C. 206; property)', () => {
    fc.assert(
      fc.property(payInputArb, (input) => {
        const hours = add(input.hours.map((h) => new D(h.hours)));
        fc.pre(hours.gt(0)); // without hours there is no wage floor, and a negative commission is simply recovered
        const r = computePay(input);
        const earned = new D(r.grossPay).minus(r.tips);
        // each weekly top-up is rounded once, so allow half a cent per workweek
        expect(earned.gte(new D(input.wageRules.minimumWage).times(hours).minus(new D('0.005').times(r.workweeks.length)))).toBe(true);
      }),
    );
  });

  it('splitting a line between two stylists with shares summing to 1 conserves revenue and charge to within the rounding of each sheet (property)', () => {
    fc.assert(
      fc.property(payInputArb, fc.integer({ min: 0, max: 1000 }), (input, thousandths) => {
        const lines = input.serviceLines.map(({ share: _share, ...line }) => line);
        const first = scaled(thousandths, 3);
        const second = new D(1).minus(first).toFixed();
        const whole = computePay({ ...input, serviceLines: lines });
        const a = computePay({ ...input, serviceLines: lines.map((l) => ({ ...l, share: first })) });
        const b = computePay({ ...input, serviceLines: lines.map((l) => ({ ...l, share: second })) });
        for (const key of ['serviceRevenue', 'productCharge'] as const) {
          // each of the three sheets rounds once (error under half a cent), so the two halves land within one cent
          expect(new D(a[key]).plus(b[key]).minus(whole[key]).abs().lte('0.01')).toBe(true);
        }
      }),
    );
  });

  it('splitting conserves revenue and charge exactly when every part is a whole number of cents (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: -500, max: 2000 }), fc.boolean()), { maxLength: 8 }), fc.integer({ min: 0, max: 100 }), (raw, percent) => {
        const lines = raw.map(([dollars, isColour], i) => ({ id: `l${i}`, date: '2024-03-05', price: `${dollars}.00`, isColour, productCost: '0' }));
        const base: PayInput = {
          plan: { tierMode: 'marginal', tiers: [{ from: '0', rate: '0.4' }], productCharge: { mode: 'fixed-per-colour-service', value: '12.00' }, retailRate: '0' },
          serviceLines: lines,
          retailLines: [],
          tips: [],
          hours: [],
          wageRules: { minimumWage: '7.25', overtimeAfterHours: '40', overtimeMultiplier: '1.5', workweekStartsOn: 0, commissionExemption: false },
        };
        const first = scaled(percent, 2);
        const second = new D(1).minus(first).toFixed();
        const whole = computePay(base);
        const a = computePay({ ...base, serviceLines: lines.map((l) => ({ ...l, share: first })) });
        const b = computePay({ ...base, serviceLines: lines.map((l) => ({ ...l, share: second })) });
        expect(new D(a.serviceRevenue).plus(b.serviceRevenue).eq(whole.serviceRevenue)).toBe(true);
        expect(new D(a.productCharge).plus(b.productCharge).eq(whole.productCharge)).toBe(true);
      }),
    );
  });
});
