import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { costPerGram, toGrams, toMillilitres, toRecordedGrams } from './units.js';

// mathjs with BigNumber units: an independent, exact implementation of the same definitions.
const math = create(all ?? {}, { number: 'BigNumber', precision: 64 });
const MATHJS_UNIT = { g: 'g', kg: 'kg', oz: 'oz', lb: 'lb', mL: 'mL', L: 'L', 'fl oz': 'floz' } as const;

function viaMathjs(amount: string, from: keyof typeof MATHJS_UNIT, to: 'g' | 'mL'): string {
  return String(math.unit(math.bignumber(amount), MATHJS_UNIT[from]).toNumeric(to));
}

const amount = fc
  .tuple(fc.bigInt({ min: 0n, max: 10n ** 9n }), fc.integer({ min: 0, max: 4 }))
  .map(([n, dp]) => (dp === 0 ? n.toString() : `${n / 10n ** BigInt(dp)}.${(n % 10n ** BigInt(dp)).toString().padStart(dp, '0')}`));

describe('toGrams', () => {
  it('uses the exact avoirdupois definitions (NIST Handbook 44 Appendix C; NIST SP 811 Appendix B)', () => {
    expect(toGrams('1', 'lb')).toBe('453.59237');
    expect(toGrams('1', 'oz')).toBe('28.349523125');
    expect(toGrams('16', 'oz')).toBe(toGrams('1', 'lb')); // 1 oz = 1/16 lb, NIST Handbook 44 Appendix C
    expect(toGrams('2.5', 'kg')).toBe('2500');
    expect(toGrams('60', 'g')).toBe('60');
  });

  it('matches mathjs unit conversion exactly for any amount (property)', () => {
    fc.assert(
      fc.property(amount, fc.constantFrom('g' as const, 'kg' as const, 'oz' as const, 'lb' as const), (value, unit) => {
        expect(new Decimal(toGrams(value, unit)).eq(viaMathjs(value, unit, 'g'))).toBe(true);
      }),
    );
  });

  it('refuses a volume unit, a bad amount, and numbers that are not strings', () => {
    expect(() => toGrams('1', 'fl oz' as never)).toThrow(expect.objectContaining({ field: 'unit' }));
    expect(() => toGrams('1e3', 'g')).toThrow(expect.objectContaining({ field: 'amount' }));
    expect(() => toGrams(5 as never, 'g')).toThrow(expect.objectContaining({ code: 'domain.invalid_input' }));
  });
});

describe('toMillilitres', () => {
  it('uses the exact US fluid ounce (NIST Handbook 44 Appendix C: 1 gal = 231 in³ = 3785.411784 mL, 1 fl oz = 1/128 gal)', () => {
    expect(toMillilitres('1', 'fl oz')).toBe('29.5735295625');
    expect(toMillilitres('128', 'fl oz')).toBe('3785.411784');
    expect(toMillilitres('0.25', 'L')).toBe('250');
  });

  it('is not the imperial fluid ounce (28.4130625 mL, NIST Handbook 44 Appendix C) nor the 30 mL label ounce of 21 CFR 101.9', () => {
    expect(toMillilitres('1', 'fl oz')).not.toBe('28.4130625');
    expect(toMillilitres('1', 'fl oz')).not.toBe('30');
  });

  it('matches mathjs unit conversion exactly for any amount (property)', () => {
    fc.assert(
      fc.property(amount, fc.constantFrom('mL' as const, 'L' as const, 'fl oz' as const), (value, unit) => {
        expect(new Decimal(toMillilitres(value, unit)).eq(viaMathjs(value, unit, 'mL'))).toBe(true);
      }),
    );
  });
});

describe('costPerGram', () => {
  it('costs a tube sold by weight in ounces (oz is mass, NIST Handbook 44 Appendix C), exact, 6 decimals', () => {
    // 14.00 for a 2 oz tube: 14 / 56.69904625 g = 0.24691773…
    expect(costPerGram('14.00', '2', 'oz')).toEqual({ costPerGram: '0.246918', approximate: false });
    expect(costPerGram('9.00', '90', 'g')).toEqual({ costPerGram: '0.100000', approximate: false });
  });

  it('converts a bottle sold by volume through its density', () => {
    // 1 L at 1.05 g/mL weighs 1050 g: 21.00 / 1050 = 0.02
    expect(costPerGram('21.00', '1', 'L', '1.05')).toEqual({ costPerGram: '0.020000', approximate: false });
  });

  it('assumes 1 g per mL without a density and flags the figure approximate (REFERENCES.md: take density from the safety data sheet)', () => {
    // 16 fl oz = 473.176473 mL ≈ 473.176473 g: 12.00 / 473.176473 = 0.0253605…
    expect(costPerGram('12.00', '16', 'fl oz')).toEqual({ costPerGram: '0.025361', approximate: true });
  });

  it('never treats an ounce of weight as a fluid ounce: the same number gives different grams', () => {
    const byWeight = costPerGram('10.00', '8', 'oz').costPerGram;
    const byVolume = costPerGram('10.00', '8', 'fl oz').costPerGram;
    expect(byWeight).not.toBe(byVolume);
  });

  it('agrees with a decimal.js recomputation from the mathjs grams (property)', () => {
    fc.assert(
      fc.property(
        fc.bigInt({ min: 0n, max: 100_000n }),
        amount.filter((a) => new Decimal(a).gt(0)),
        fc.constantFrom('g' as const, 'kg' as const, 'oz' as const, 'lb' as const),
        (cents, size, unit) => {
          const cost = `${cents / 100n}.${(cents % 100n).toString().padStart(2, '0')}`;
          const grams = viaMathjs(size, unit, 'g');
          const expected = new Decimal(cost).div(grams).toDecimalPlaces(6, Decimal.ROUND_HALF_UP).toFixed(6);
          expect(costPerGram(cost, size, unit).costPerGram).toBe(expected);
        },
      ),
    );
  });

  it('refuses an empty container, a negative price and a zero density', () => {
    expect(() => costPerGram('10', '0', 'g')).toThrow(expect.objectContaining({ field: 'containerSize' }));
    expect(() => costPerGram('-1', '10', 'g')).toThrow(expect.objectContaining({ field: 'containerCost' }));
    expect(() => costPerGram('10', '10', 'mL', '0')).toThrow(expect.objectContaining({ field: 'densityGramsPerMl' }));
    expect(() => costPerGram('10', '10', 'gallon' as never)).toThrow(expect.objectContaining({ field: 'unit' }));
  });
});

describe('toRecordedGrams', () => {
  it('keeps grams to the milligram: 2 oz = 56.69904625 g (NIST Handbook 44, Appendix C) is recorded as 56.699 g', () => {
    expect(toRecordedGrams('2', 'oz')).toBe('56.699');
    expect(toRecordedGrams('0.5', 'oz')).toBe('14.175'); // 14.1747615625 g, half-up
    expect(toRecordedGrams('45.5', 'g')).toBe('45.5');
  });
});
