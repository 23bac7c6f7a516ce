import { DomainError, parseDecimal, type Reconciliation, reconcileDay } from '@tressury/domain';
import type { DayPreview } from '../api/day-close-queries';

/** US notes and coins, largest first; a drawer may be counted by them instead of as one total. */
export const denominations = ['100', '50', '20', '10', '5', '1', '0.25', '0.10', '0.05', '0.01'] as const;

export type CountMode = 'total' | 'denominations';

export type LiveCount =
  | { state: 'empty' }
  | { state: 'problem'; field: string; message: string }
  | { state: 'counted'; reconciliation: Reconciliation; denominations?: Record<string, number> };

/** The variances while the drawer is counted, from the same reconcileDay the API closes the day with. */
export function liveCount(preview: DayPreview, mode: CountMode, total: string, counts: Record<string, string>): LiveCount {
  const base = {
    expectedCash: preview.expectedCash,
    cardTotalTickets: preview.cardTotalTickets,
    cardTotalProcessor: preview.cardTotalProcessor,
    varianceNoteThreshold: preview.varianceNoteThreshold,
  };
  try {
    if (mode === 'total') {
      if (total.trim() === '') return { state: 'empty' };
      return { state: 'counted', reconciliation: reconcileDay({ ...base, countedCash: total.trim() }) };
    }
    const typed = Object.entries(counts).filter(([, count]) => count.trim() !== '');
    if (typed.length === 0) return { state: 'empty' };
    const bad = typed.find(([, count]) => !/^\d+$/.test(count.trim()));
    if (bad) return { state: 'problem', field: `denominations.${bad[0]}`, message: `Count the ${bad[0]}s as a whole number.` };
    const counted = Object.fromEntries(typed.filter(([, count]) => Number(count) > 0).map(([face, count]) => [face, Number(count)]));
    return { state: 'counted', reconciliation: reconcileDay({ ...base, denominations: counted }), denominations: counted };
  } catch (error) {
    if (error instanceof DomainError) {
      const message = error.field === 'countedCash' ? 'Write the cash counted as an amount, such as 412.35.' : error.message;
      return { state: 'problem', field: error.field ?? 'countedCash', message };
    }
    throw error;
  }
}

/** face × count, exactly, for the row beside each denomination. */
export function denominationValue(face: string, count: string): string | null {
  if (!/^\d+$/.test(count.trim())) return null;
  return parseDecimal(face, 'face').times(count.trim()).toFixed(2);
}

/** "-7.50" → "7.50 short", "2.00" → "2.00 over", "0.00" → "matches". */
export function varianceText(variance: string, short: string, over: string): string {
  const sign = parseDecimal(variance, 'variance').cmp(0);
  if (sign === 0) return 'matches';
  return sign < 0 ? `${variance.slice(1)} ${short}` : `${variance} ${over}`;
}

/** The card side does not wait for the drawer: reconciled against a drawer that holds exactly what is expected. */
export function cardVarianceOf(preview: DayPreview): string {
  return reconcileDay({
    expectedCash: preview.expectedCash,
    countedCash: preview.expectedCash,
    cardTotalTickets: preview.cardTotalTickets,
    cardTotalProcessor: preview.cardTotalProcessor,
    varianceNoteThreshold: preview.varianceNoteThreshold,
  }).cardVariance;
}
