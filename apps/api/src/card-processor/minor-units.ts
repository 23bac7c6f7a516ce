import Big from 'big.js';
import { DomainError, parseDecimal } from '@tressury/domain';

// Currencies the card processor takes in whole units or in thousandths (its currency docs, from memory;
// they follow the ISO 4217 minor-unit exponents for these codes).
const ZERO_DECIMAL = new Set(['BIF', 'CLP', 'DJF', 'GNF', 'JPY', 'KMF', 'KRW', 'MGA', 'PYG', 'RWF', 'UGX', 'VND', 'VUV', 'XAF', 'XOF', 'XPF']);
const THREE_DECIMAL = new Set(['BHD', 'JOD', 'KWD', 'OMR', 'TND']);

/** How many decimal places one minor unit of the currency stands for. */
export function minorUnitExponent(currency: string): number {
  const code = currency.toUpperCase();
  if (ZERO_DECIMAL.has(code)) return 0;
  if (THREE_DECIMAL.has(code)) return 3;
  return 2;
}

/** "42.50" USD → 4250: the whole number of minor units the processor expects; a positive amount only. */
export function toMinorUnits(amount: string, currency: string, field = 'amount'): number {
  const value = parseDecimal(amount, field);
  const exponent = minorUnitExponent(currency);
  const minor = value.times(new Big(10).pow(exponent));
  if (!minor.eq(minor.round(0, Big.roundDown))) {
    throw new DomainError('card_processor.amount_precision', `${field} has more decimal places than ${currency.toUpperCase()} allows (${exponent}).`, 'invalid', field);
  }
  if (minor.lte(0)) throw new DomainError('card_processor.amount_not_positive', `${field} must be more than zero.`, 'invalid', field);
  // The SDK's PaymentIntent.amount doc: up to eight digits of minor units (99999999 is $999,999.99).
  if (minor.gt(99_999_999)) throw new DomainError('card_processor.amount_too_large', `${field} is more than a card payment can carry.`, 'invalid', field);
  return Number(minor.toFixed(0));
}

/** 4250 USD → "42.50"; at least two decimals, as every money string in the app. */
export function fromMinorUnits(minor: number | Big, currency: string): string {
  const exponent = minorUnitExponent(currency);
  return new Big(minor).div(new Big(10).pow(exponent)).toFixed(Math.max(2, exponent));
}
