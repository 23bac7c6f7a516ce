import { invalid } from '../fields.js';
import { moneyOf, moneyText, parseDecimal, sum } from '../money.js';

export type Reconciliation = {
  countedCash: string;
  cashVariance: string;
  cardVariance: string;
  /** True when either variance is larger (either way) than the branch's threshold. */
  needsNote: boolean;
};

/**
 * Counted cash against what the day's tickets say, card total against the processor's.
 * With denominations (face value as a decimal string → count), the count is their sum and must
 * equal a counted total given alongside.
 */
export function reconcileDay(input: {
  expectedCash: string;
  countedCash?: string;
  denominations?: Record<string, number>;
  cardTotalTickets: string;
  cardTotalProcessor: string;
  varianceNoteThreshold: string;
}): Reconciliation {
  let counted = input.countedCash === undefined ? undefined : parseDecimal(input.countedCash, 'countedCash');
  if (input.denominations) {
    const parts = Object.entries(input.denominations).map(([face, count]) => {
      const value = parseDecimal(face, `denominations.${face}`);
      if (value.lte(0)) throw invalid(`denominations.${face}`, 'a denomination must be more than 0');
      if (!Number.isInteger(count) || count < 0) throw invalid(`denominations.${face}`, 'a count must be a whole number, 0 or more');
      return value.times(count);
    });
    const fromDenominations = moneyOf(sum(parts));
    if (counted && !counted.eq(fromDenominations)) {
      throw invalid('countedCash', `countedCash ${moneyText(counted)} does not match the denominations, which add up to ${moneyText(fromDenominations)}`);
    }
    counted = fromDenominations;
  }
  if (!counted) throw invalid('countedCash', 'countedCash or denominations is required');
  if (counted.lt(0)) throw invalid('countedCash', 'countedCash must not be negative');
  const threshold = parseDecimal(input.varianceNoteThreshold, 'varianceNoteThreshold');
  const cashVariance = moneyOf(counted.minus(parseDecimal(input.expectedCash, 'expectedCash')));
  const cardVariance = moneyOf(parseDecimal(input.cardTotalProcessor, 'cardTotalProcessor').minus(parseDecimal(input.cardTotalTickets, 'cardTotalTickets')));
  return {
    countedCash: moneyText(counted),
    cashVariance: moneyText(cashVariance),
    cardVariance: moneyText(cardVariance),
    needsNote: cashVariance.abs().gt(threshold) || cardVariance.abs().gt(threshold),
  };
}
