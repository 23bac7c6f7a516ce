import { invalid } from '../fields.js';
import { moneyText, parseDecimal } from '../money.js';

/** What the client pays for a service: the level's list price less a discount that may not exceed it. */
export function serviceLinePrice(input: { listPrice: string; discount: string }): string {
  const listPrice = parseDecimal(input.listPrice, 'listPrice');
  const discount = parseDecimal(input.discount, 'discount');
  if (discount.lt(0)) throw invalid('discount', 'discount must not be negative');
  if (discount.gt(listPrice)) throw invalid('discount', 'discount may not be more than the price');
  return moneyText(listPrice.minus(discount));
}
