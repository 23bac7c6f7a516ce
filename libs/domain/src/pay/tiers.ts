import Big from 'big.js';
import { decimalText, moneyOf, moneyText, sum } from '../money.js';
import type { Tier, TierMode } from './types.js';

export type TierRow = { from: string; to: string | null; rate: string; base: string; commission: string };

/**
 * Tiered commission on the period's commissionable revenue (common practice in the trade).
 * Marginal: each band [from, next from) at its own rate. Whole period: everything at the rate of the
 * highest tier reached, so crossing a threshold lifts all of it (a cliff). Negative revenue (refunds
 * outweighing sales) falls in the first tier. The total is the sum of the rounded band commissions.
 */
export function tierCommission(revenue: Big, tiers: Tier[], mode: TierMode): { rows: TierRow[]; total: Big } {
  const reached = tiers.reduce((highest, tier, i) => (revenue.gte(tier.from) ? i : highest), 0);
  const bases = tiers.map((tier, i) => {
    const upper = tiers[i + 1]?.from;
    if (mode === 'whole-period') return i === reached ? revenue : new Big(0);
    const top = upper !== undefined && revenue.gt(upper) ? upper : revenue;
    if (i === 0) return top;
    return top.gt(tier.from) ? top.minus(tier.from) : new Big(0);
  });
  const commissions = tiers.map((tier, i) => moneyOf((bases[i] ?? new Big(0)).times(tier.rate)));
  const rows = tiers.map((tier, i) => {
    const next = tiers[i + 1];
    return {
      from: decimalText(tier.from, 2),
      to: next ? decimalText(next.from, 2) : null,
      rate: tier.rate.toFixed(),
      base: moneyText(bases[i] ?? new Big(0)),
      commission: moneyText(commissions[i] ?? new Big(0)),
    };
  });
  return { rows, total: sum(commissions) };
}
