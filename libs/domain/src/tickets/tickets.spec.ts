import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../errors.js';
import { retailLineAmounts } from './retail-line.js';
import { serviceLinePrice } from './service-line-price.js';
import { ticketTotals } from './ticket-totals.js';

const HalfUp = Decimal.clone({ rounding: Decimal.ROUND_HALF_UP, precision: 50 });
const cents = fc.integer({ min: 0, max: 100_000 }).map((c) => (c / 100).toFixed(2));

describe('retailLineAmounts', () => {
  // Sales tax rounded half-up to the cent per line is common practice; each US state sets its own
  // rounding rule, so local law governs.
  it('taxes 3 × 12.99 at 8.25 % as 3.22 (38.97 × 0.0825 = 3.215025, half-up)', () => {
    expect(retailLineAmounts({ quantity: 3, unitPrice: '12.99', taxRate: '0.0825' })).toEqual({ amount: '38.97', tax: '3.22' });
  });

  it('gives a returned item the same figures with the opposite sign', () => {
    expect(retailLineAmounts({ quantity: -3, unitPrice: '12.99', taxRate: '0.0825' })).toEqual({ amount: '-38.97', tax: '-3.22' });
  });

  it('agrees with an independent decimal.js computation for any quantity, price and rate', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 50 }), cents, fc.integer({ min: 0, max: 150_00 }), (quantity, unitPrice, bps) => {
        const taxRate = new HalfUp(bps).div(100_000).toFixed();
        const amount = new HalfUp(unitPrice).times(quantity).toDecimalPlaces(2);
        const tax = amount.times(taxRate).toDecimalPlaces(2);
        expect(retailLineAmounts({ quantity, unitPrice, taxRate })).toEqual({ amount: amount.toFixed(2), tax: tax.toFixed(2) });
      }),
    );
  });

  it('refuses a zero or fractional quantity, a negative price and a rate outside 0..1, naming the field', () => {
    const fieldOf = (f: () => unknown) => {
      try {
        f();
      } catch (error) {
        return (error as DomainError).field;
      }
      return null;
    };
    expect(fieldOf(() => retailLineAmounts({ quantity: 0, unitPrice: '1', taxRate: '0' }))).toBe('quantity');
    expect(fieldOf(() => retailLineAmounts({ quantity: 1.5, unitPrice: '1', taxRate: '0' }))).toBe('quantity');
    expect(fieldOf(() => retailLineAmounts({ quantity: 1, unitPrice: '-1', taxRate: '0' }))).toBe('unitPrice');
    expect(fieldOf(() => retailLineAmounts({ quantity: 1, unitPrice: '1', taxRate: '8.25' }))).toBe('taxRate');
  });
});

describe('serviceLinePrice', () => {
  it('takes the discount off the list price', () => {
    expect(serviceLinePrice({ listPrice: '145.00', discount: '14.50' })).toBe('130.50');
  });

  it('refuses a discount larger than the price or below zero', () => {
    expect(() => serviceLinePrice({ listPrice: '50.00', discount: '50.01' })).toThrow(DomainError);
    expect(() => serviceLinePrice({ listPrice: '50.00', discount: '-1' })).toThrow(DomainError);
  });
});

describe('ticketTotals', () => {
  it('adds services, retail, tax and tips, and counts only settled payments', () => {
    const totals = ticketTotals({
      serviceLines: [{ price: '145.00' }, { price: '65.00' }],
      retailLines: [{ amount: '38.97', tax: '3.22' }],
      tips: [{ amount: '30.00' }],
      payments: [
        { amount: '200.00', status: 'succeeded' },
        { amount: '82.19', status: 'failed' },
        { amount: '50.00', status: 'pending' },
      ],
    });
    expect(totals).toEqual({ services: '210.00', retail: '38.97', tax: '3.22', tips: '30.00', total: '282.19', paid: '200.00', due: '82.19' });
  });

  it('always has total = services + retail + tax + tips and due = total − paid, to the cent', () => {
    fc.assert(
      fc.property(fc.array(cents, { maxLength: 6 }), fc.array(fc.tuple(cents, cents), { maxLength: 4 }), fc.array(cents, { maxLength: 3 }), fc.array(cents, { maxLength: 3 }), (services, retail, tips, paid) => {
        const totals = ticketTotals({
          serviceLines: services.map((price) => ({ price })),
          retailLines: retail.map(([amount, tax]) => ({ amount, tax })),
          tips: tips.map((amount) => ({ amount })),
          payments: paid.map((amount) => ({ amount, status: 'succeeded' as const })),
        });
        const add = (xs: string[]) => xs.reduce((s, x) => s.plus(x), new HalfUp(0));
        expect(totals.total).toBe(add([totals.services, totals.retail, totals.tax, totals.tips]).toFixed(2));
        expect(totals.due).toBe(new HalfUp(totals.total).minus(totals.paid).toFixed(2));
        expect(totals.services).toBe(add(services).toFixed(2));
      }),
    );
  });
});
