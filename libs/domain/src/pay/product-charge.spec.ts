import Big from 'big.js';
import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lineAmounts, lineCharge, serviceTotals } from './product-charge.js';
import type { ProductChargeRule, ServiceLine } from './types.js';

function line(price: string, isColour: boolean, productCost = '0', share = '1'): ServiceLine {
  return { price: new Big(price), isColour, productCost: new Big(productCost), share: new Big(share) };
}
function rule(mode: ProductChargeRule['mode'], value = '0', markup = '0'): ProductChargeRule {
  return { mode, value: new Big(value), markup: new Big(markup) };
}
const text = (value: Big) => value.toFixed();

describe('product charge of a service line (common practice in the trade: deducted before commission)', () => {
  it('none charges nothing', () => {
    expect(text(lineCharge(line('150', true, '18'), rule('none')))).toBe('0');
  });

  it('actual cost charges the product used, with an optional markup, on any line that used product', () => {
    expect(text(lineCharge(line('150', true, '18'), rule('actual-cost')))).toBe('18');
    expect(text(lineCharge(line('150', true, '18'), rule('actual-cost', '0', '0.10')))).toBe('19.8');
    expect(text(lineCharge(line('60', false, '4.5'), rule('actual-cost')))).toBe('4.5');
  });

  it('a percentage of price applies to colour services only (often about 10 %)', () => {
    expect(text(lineCharge(line('150', true), rule('percent-of-price', '0.10')))).toBe('15');
    expect(text(lineCharge(line('45', false), rule('percent-of-price', '0.10')))).toBe('0');
  });

  it('a fixed amount applies per colour service only', () => {
    expect(text(lineCharge(line('150', true), rule('fixed-per-colour-service', '12')))).toBe('12');
    expect(text(lineCharge(line('45', false), rule('fixed-per-colour-service', '12')))).toBe('0');
  });

  it('never exceeds the price of the line (issue 3, rule 1)', () => {
    expect(text(lineCharge(line('8', true), rule('fixed-per-colour-service', '12')))).toBe('8');
    expect(text(lineCharge(line('20', true, '35'), rule('actual-cost')))).toBe('20');
    expect(text(lineCharge(line('0', true), rule('fixed-per-colour-service', '12')))).toBe('0');
  });

  it('charges nothing on a refund line with a negative price (issue 3, rule 1)', () => {
    expect(text(lineCharge(line('-150', true, '18'), rule('actual-cost')))).toBe('0');
    expect(text(lineCharge(line('-150', true), rule('fixed-per-colour-service', '12')))).toBe('0');
  });

  it('scales price and charge by the stylist\'s share, after the cap (issue 3, rule 2)', () => {
    const assisted = lineAmounts(line('10', true, '0', '0.25'), rule('fixed-per-colour-service', '12'));
    expect(text(assisted.revenue)).toBe('2.5');
    expect(text(assisted.charge)).toBe('2.5');
  });

  it('sums lines exactly (issue 3, rule 3)', () => {
    const totals = serviceTotals([line('100', true, '10', '0.5'), line('-40', false), line('33.33', true, '3.333')], rule('actual-cost'));
    expect(text(totals.revenue)).toBe('43.33');
    expect(text(totals.charge)).toBe('8.333');
  });

  it('splitting a line between two stylists with shares summing to 1 conserves revenue and charge exactly (property)', () => {
    const cents = fc.bigInt({ min: -100_000n, max: 500_000n });
    const toMoney = (c: bigint) => new Decimal(c.toString()).div(100).toFixed(2);
    const rules = fc.oneof(
      fc.constant(rule('none')),
      fc.integer({ min: 0, max: 100 }).map((markup) => rule('actual-cost', '0', new Decimal(markup).div(100).toFixed())),
      fc.integer({ min: 0, max: 100 }).map((p) => rule('percent-of-price', new Decimal(p).div(100).toFixed())),
      cents.filter((c) => c >= 0n).map((c) => rule('fixed-per-colour-service', toMoney(c))),
    );
    fc.assert(
      fc.property(cents, fc.boolean(), cents.filter((c) => c >= 0n), fc.integer({ min: 0, max: 1000 }), rules, (price, isColour, cost, thousandths, r) => {
        const share = new Decimal(thousandths).div(1000).toFixed();
        const rest = new Decimal(1).minus(share).toFixed();
        const whole = lineAmounts(line(toMoney(price), isColour, toMoney(cost)), r);
        const first = lineAmounts(line(toMoney(price), isColour, toMoney(cost), share), r);
        const second = lineAmounts(line(toMoney(price), isColour, toMoney(cost), rest), r);
        expect(first.revenue.plus(second.revenue).eq(whole.revenue)).toBe(true);
        expect(first.charge.plus(second.charge).eq(whole.charge)).toBe(true);
        // decimal.js recomputation of the whole line's revenue
        expect(new Decimal(text(whole.revenue)).eq(toMoney(price))).toBe(true);
      }),
    );
  });
});
