import { DomainError } from '@tressury/domain';
import { fromMinorUnits, toMinorUnits } from './minor-units.js';

// Minor-unit exponents follow ISO 4217 (USD 2, JPY 0, KWD 3); the processor sends amounts in those units.
describe('minor units', () => {
  it('turns decimal strings into whole minor units without floating point', () => {
    expect(toMinorUnits('42.50', 'USD')).toBe(4250);
    expect(toMinorUnits('0.29', 'usd')).toBe(29); // 0.29 * 100 is 28.999999999999996 in floating point
    expect(toMinorUnits('123456.78', 'EUR')).toBe(12345678);
    expect(toMinorUnits('1500', 'JPY')).toBe(1500);
    expect(toMinorUnits('1.25', 'KWD')).toBe(1250);
  });

  it('refuses more decimals than the currency has, zero, negatives and non-strings, naming the field', () => {
    for (const [amount, currency] of [['1.005', 'USD'], ['10.5', 'JPY'], ['0', 'USD'], ['-3.00', 'USD'], ['1e3', 'USD']] as const) {
      expect(() => toMinorUnits(amount, currency, 'payment.amount')).toThrow(DomainError);
      try {
        toMinorUnits(amount, currency, 'payment.amount');
      } catch (error) {
        expect((error as DomainError).field).toBe('payment.amount');
      }
    }
    expect(() => toMinorUnits(12.5 as unknown as string, 'USD')).toThrow(DomainError);
  });

  it('refuses an amount over the eight-digit limit', () => {
    expect(toMinorUnits('999999.99', 'USD')).toBe(99_999_999);
    expect(() => toMinorUnits('1000000.00', 'USD')).toThrow(DomainError);
  });

  it('writes minor units back as money strings', () => {
    expect(fromMinorUnits(4250, 'usd')).toBe('42.50');
    expect(fromMinorUnits(7, 'USD')).toBe('0.07');
    expect(fromMinorUnits(1500, 'JPY')).toBe('1500.00');
    expect(fromMinorUnits(1250, 'KWD')).toBe('1.250');
  });
});
