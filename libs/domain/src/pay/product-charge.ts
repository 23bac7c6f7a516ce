import Big from 'big.js';
import { sum } from '../money.js';
import type { ProductChargeRule, ServiceLine } from './types.js';

/**
 * Colour product charged back on a whole line before commission (common practice in the trade:
 * actual cost, a percentage of price, or a fixed amount per colour service). Capped at the price;
 * a refund line (negative price) carries none.
 */
export function lineCharge(line: ServiceLine, rule: ProductChargeRule): Big {
  if (line.price.lte(0)) return new Big(0);
  let charge: Big;
  switch (rule.mode) {
    case 'none':
      charge = new Big(0);
      break;
    case 'actual-cost':
      charge = line.productCost.times(rule.markup.plus(1));
      break;
    case 'percent-of-price':
      charge = line.isColour ? line.price.times(rule.value) : new Big(0);
      break;
    case 'fixed-per-colour-service':
      charge = line.isColour ? rule.value : new Big(0);
      break;
  }
  return charge.gt(line.price) ? line.price : charge;
}

/** The stylist's part of a line: the share scales price and charge alike, so split parts add up to the whole line. */
export function lineAmounts(line: ServiceLine, rule: ProductChargeRule): { revenue: Big; charge: Big } {
  return { revenue: line.price.times(line.share), charge: lineCharge(line, rule).times(line.share) };
}

/** Exact sums over the period; the caller rounds each once. */
export function serviceTotals(lines: ServiceLine[], rule: ProductChargeRule): { revenue: Big; charge: Big } {
  const amounts = lines.map((line) => lineAmounts(line, rule));
  return { revenue: sum(amounts.map((a) => a.revenue)), charge: sum(amounts.map((a) => a.charge)) };
}
