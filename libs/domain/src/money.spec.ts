import Big from 'big.js';
import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from './errors.js';
import { negateMoney, parseDecimal, roundMoney, roundQuotient, sumMoney } from './money.js';

const D = Decimal.clone({ precision: 100, rounding: Decimal.ROUND_HALF_UP });

/** A scaled integer written as a decimal string: (12345n, 3) → "12.345". */
function scaled(n: bigint, dp: number): string {
  const digits = (n < 0n ? -n : n).toString().padStart(dp + 1, '0');
  const text = dp === 0 ? digits : `${digits.slice(0, -dp)}.${digits.slice(-dp)}`;
  return n < 0n ? `-${text}` : text;
}

const decimalString = fc
  .tuple(fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n }), fc.integer({ min: 0, max: 6 }))
  .map(([n, dp]) => scaled(n, dp));

describe('parseDecimal', () => {
  it.each(['12', '12.50', '-3.1', '0', '0.005', '1234567890.123456789'])('accepts %s', (text) => {
    expect(parseDecimal(text, 'price').eq(new Big(text))).toBe(true);
  });

  it.each<[unknown]>([[''], ['abc'], ['1e5'], ['12.'], ['.5'], ['+1'], [' 1'], ['1,5'], ['NaN'], ['Infinity'], [12], [12.5], [null], [undefined]])(
    'refuses %j with the field path',
    (value) => {
      try {
        parseDecimal(value, 'serviceLines[3].price');
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(DomainError);
        expect(error).toMatchObject({ code: 'domain.invalid_input', kind: 'invalid', field: 'serviceLines[3].price' });
      }
    },
  );
});

describe('roundMoney: half-up to the cent', () => {
  it.each([
    ['1.005', '1.01'],
    ['2.675', '2.68'], // 2.675 as a binary float is 2.67499…; decimals must not inherit that
    ['1.004999', '1.00'],
    ['-1.005', '-1.01'], // a tie rounds away from zero, so a refund mirrors its sale
    ['-0.004', '0.00'],
    ['12', '12.00'],
    ['0.1', '0.10'],
  ])('%s → %s', (value, expected) => {
    expect(roundMoney(value)).toBe(expected);
  });

  it('rounds a half cent up, whatever the cents (property)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 12n }), (cents) => {
        expect(roundMoney(`${scaled(cents, 2)}5`)).toBe(scaled(cents + 1n, 2));
        expect(roundMoney(`${scaled(cents, 2)}4999`)).toBe(scaled(cents, 2));
      }),
    );
  });

  it('agrees with decimal.js ROUND_HALF_UP and moves a value by at most half a cent (property)', () => {
    fc.assert(
      fc.property(decimalString, (text) => {
        const rounded = roundMoney(text);
        expect(rounded).toBe(new D(text).toFixed(2, Decimal.ROUND_HALF_UP).replace(/^-(0\.00)$/, '$1'));
        expect(new D(rounded).minus(text).abs().lte('0.005')).toBe(true);
        expect(rounded).toMatch(/^-?\d+\.\d{2}$/);
      }),
    );
  });
});

describe('sumMoney', () => {
  it('adds the rounded parts, so the total matches the figures on the sheet', () => {
    expect(sumMoney(['0.005', '0.005'])).toBe('0.02');
    expect(roundMoney('0.01')).toBe('0.01'); // rounding the exact sum would have said 0.01
    expect(sumMoney([])).toBe('0.00');
  });

  it('names the bad element', () => {
    expect(() => sumMoney(['1.00', 'x'])).toThrow(expect.objectContaining({ field: 'values[1]' }));
  });

  it('equals the decimal.js sum of each part rounded half-up (property)', () => {
    fc.assert(
      fc.property(fc.array(decimalString, { maxLength: 20 }), (values) => {
        const expected = values.reduce((t, v) => t.plus(new D(v).toDecimalPlaces(2, Decimal.ROUND_HALF_UP)), new D(0));
        expect(new D(sumMoney(values)).eq(expected)).toBe(true);
      }),
    );
  });
});

describe('roundQuotient: one exact division', () => {
  it('rounds exact ties half-up and long expansions correctly', () => {
    expect(roundQuotient(new Big(1), new Big(8), 2).toFixed(2)).toBe('0.13');
    expect(roundQuotient(new Big(-1), new Big(8), 2).toFixed(2)).toBe('-0.13');
    expect(roundQuotient(new Big(1), new Big(-8), 2).toFixed(2)).toBe('-0.13');
    expect(roundQuotient(new Big(2), new Big(3), 2).toFixed(2)).toBe('0.67');
    expect(roundQuotient(new Big('0.0375'), new Big(3), 2).toFixed(2)).toBe('0.01');
    expect(roundQuotient(new Big('37.035'), new Big(3), 2).toFixed(2)).toBe('12.35'); // 12.345 exactly
  });

  it('agrees with decimal.js at 100 significant digits (property)', () => {
    fc.assert(
      fc.property(
        decimalString,
        decimalString.filter((d) => !new D(d).isZero()),
        fc.integer({ min: 0, max: 6 }),
        (n, d, dp) => {
          const expected = new D(n).div(d).toDecimalPlaces(dp, Decimal.ROUND_HALF_UP);
          expect(new D(roundQuotient(new Big(n), new Big(d), dp).toFixed()).eq(expected)).toBe(true);
        },
      ),
    );
  });
});

describe('negateMoney', () => {
  it('mirrors an amount to the cent, and never prints -0.00', () => {
    expect(negateMoney('55.00')).toBe('-55.00');
    expect(negateMoney('-24.5')).toBe('24.50');
    expect(negateMoney('0')).toBe('0.00');
  });
});
