import Big from 'big.js';
import { DomainError } from './errors.js';

const DECIMAL = /^-?\d+(\.\d+)?$/;

/** Reads a decimal written as a string ("12", "12.50", "-3.1"); anything else, JS numbers included, is refused. */
export function parseDecimal(value: unknown, field: string): Big {
  if (typeof value !== 'string' || !DECIMAL.test(value)) {
    throw new DomainError(
      'domain.invalid_input',
      `${field} must be a decimal number written as a string, such as "12.50"`,
      'invalid',
      field,
    );
  }
  return new Big(value);
}

/** Half-up to `dp` places; a tie rounds away from zero, so a refund rounds like the sale it reverses. */
export function roundHalfUp(value: Big, dp: number): Big {
  return value.round(dp, Big.roundHalfUp);
}

/** numerator / denominator rounded half-up to `dp` places exactly, however long the quotient's expansion. */
export function roundQuotient(numerator: Big, denominator: Big, dp: number): Big {
  if (denominator.eq(0)) throw new Error('roundQuotient: division by zero');
  const scaled = numerator.times(new Big(10).pow(dp));
  const remainder = scaled.mod(denominator);
  let quotient = scaled.minus(remainder).div(denominator);
  if (remainder.abs().times(2).gte(denominator.abs())) {
    quotient = quotient.plus(scaled.s * denominator.s);
  }
  return quotient.div(new Big(10).pow(dp));
}

export function moneyOf(value: Big): Big {
  return roundHalfUp(value, 2);
}

/** Rounds before formatting so that a value rounding to zero never prints as "-0.00". */
export function moneyText(value: Big): string {
  return moneyOf(value).toFixed(2);
}

/** Plain notation without exponent and without trailing zeros. */
export function plainText(value: Big): string {
  return value.toFixed();
}

/** At least `minDp` decimals, more only when the value carries them. */
export function decimalText(value: Big, minDp: number): string {
  const decimals = Math.max(value.c.length - value.e - 1, 0);
  return value.toFixed(Math.max(minDp, decimals));
}

export function sum(values: Big[]): Big {
  return values.reduce((total, value) => total.plus(value), new Big(0));
}

export function roundMoney(value: string): string {
  return moneyText(parseDecimal(value, 'value'));
}

/** Each part is rounded to the cent first, so the total equals what a reader adds up on the sheet. */
export function sumMoney(values: string[]): string {
  return moneyText(sum(values.map((value, i) => moneyOf(parseDecimal(value, `values[${i}]`)))));
}

/** The same amount with the opposite sign, to the cent: a refund line mirrors the sale it reverses. */
export function negateMoney(value: string): string {
  return moneyText(parseDecimal(value, 'value').times(-1));
}
