import { parseDecimal, moneyOf, moneyText } from '../money.js';
import { invalid } from '../fields.js';

export type RetailLineAmounts = { amount: string; tax: string };

/**
 * A retail line's amount (quantity × unit price) and its sales tax, each rounded half-up to the cent
 * per line. A negative quantity is a returned item and gives negative figures.
 */
export function retailLineAmounts(input: { quantity: number; unitPrice: string; taxRate: string }): RetailLineAmounts {
  if (!Number.isInteger(input.quantity) || input.quantity === 0) throw invalid('quantity', 'quantity must be a whole number other than 0');
  const unitPrice = parseDecimal(input.unitPrice, 'unitPrice');
  if (unitPrice.lt(0)) throw invalid('unitPrice', 'unitPrice must not be negative');
  const taxRate = parseDecimal(input.taxRate, 'taxRate');
  if (taxRate.lt(0) || taxRate.gt(1)) throw invalid('taxRate', 'taxRate must be a fraction from 0 to 1');
  const amount = moneyOf(unitPrice.times(input.quantity));
  return { amount: moneyText(amount), tax: moneyText(amount.times(taxRate)) };
}
