import { describe, expect, it } from 'vitest';
import { DomainError } from '../errors.js';
import { reconcileDay } from './cash-reconciliation.js';

const base = { expectedCash: '412.50', cardTotalTickets: '1980.00', cardTotalProcessor: '1980.00', varianceNoteThreshold: '5.00' };

describe('reconcileDay', () => {
  it('reports a short drawer as a negative cash variance', () => {
    expect(reconcileDay({ ...base, countedCash: '410.00' })).toEqual({ countedCash: '410.00', cashVariance: '-2.50', cardVariance: '0.00', needsNote: false });
  });

  it('asks for a note only when a variance is larger than the threshold, either way', () => {
    expect(reconcileDay({ ...base, countedCash: '407.50' }).needsNote).toBe(false);
    expect(reconcileDay({ ...base, countedCash: '407.49' }).needsNote).toBe(true);
    expect(reconcileDay({ ...base, countedCash: '417.51' }).needsNote).toBe(true);
    expect(reconcileDay({ ...base, countedCash: '412.50', cardTotalProcessor: '1974.00' })).toMatchObject({ cardVariance: '-6.00', needsNote: true });
  });

  it('counts the drawer from US notes and coins', () => {
    // $20 × 20 + $10 × 1 + $1 × 2 + 25¢ × 2 = $412.50
    const result = reconcileDay({ ...base, denominations: { '20': 20, '10': 1, '1': 2, '0.25': 2 } });
    expect(result).toMatchObject({ countedCash: '412.50', cashVariance: '0.00' });
  });

  it('refuses a counted total that disagrees with its denominations, naming countedCash', () => {
    try {
      reconcileDay({ ...base, countedCash: '412.50', denominations: { '20': 20 } });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).field).toBe('countedCash');
    }
  });

  it('refuses a count with neither a total nor denominations, and a fractional coin count', () => {
    expect(() => reconcileDay({ ...base })).toThrow(/countedCash/);
    expect(() => reconcileDay({ ...base, denominations: { '0.25': 1.5 } })).toThrow(DomainError);
  });
});
