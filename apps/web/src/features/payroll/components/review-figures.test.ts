import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { compareDecimal, flagsOf, percentText, sumHours } from './review-figures';

const line = (figures: Partial<Parameters<typeof flagsOf>[0]>) => ({
  hours: '38',
  minimumWageTopUp: '0.00',
  overtimePremium: '0.00',
  serviceCommission: '410.00',
  retailCommission: '12.00',
  grossPay: '422.00',
  ...figures,
});

describe('review figures', () => {
  it('flags what an accountant checks twice', () => {
    expect(flagsOf(line({}))).toEqual([]);
    expect(flagsOf(line({ minimumWageTopUp: '0.01' }))).toEqual(['top-up']);
    expect(flagsOf(line({ overtimePremium: '12.40' }))).toEqual(['overtime']);
    expect(flagsOf(line({ retailCommission: '-1.20' }))).toEqual(['negative-commission']);
    expect(flagsOf(line({ hours: '0' }))).toEqual(['no-hours']);
    // Nothing to pay and no hours: nobody to check.
    expect(flagsOf(line({ hours: '0', serviceCommission: '0.00', retailCommission: '0.00', grossPay: '0.00' }))).toEqual([]);
  });

  it('adds hours exactly, as decimal.js (an independent decimal library) does', () => {
    const hours = ['7.125', '8.333', '0.1', '0.2', '9', '12.042'];
    expect(sumHours(hours)).toBe(hours.reduce((total, h) => total.plus(h), new Decimal(0)).toString());
    expect(sumHours([])).toBe('0');
  });

  it('orders figures by value, negatives first, without floats', () => {
    const figures = ['10.00', '-49.00', '9.99', '0.00', '1000.01', '-0.01'];
    expect([...figures].sort(compareDecimal)).toEqual(['-49.00', '-0.01', '0.00', '9.99', '10.00', '1000.01']);
  });

  it('writes rates as percentages exactly', () => {
    expect(percentText('0.40')).toBe('40 %');
    expect(percentText('0.405')).toBe('40.5 %');
    expect(percentText('0.0825')).toBe('8.25 %');
    expect(percentText('1')).toBe('100 %');
  });
});
