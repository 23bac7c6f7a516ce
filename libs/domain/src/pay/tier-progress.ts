import Big from 'big.js';
import { fieldPath, invalid, readArray, readChoice, readDecimal, readObject } from '../fields.js';
import { decimalText, moneyText } from '../money.js';
import { tierCommission } from './tiers.js';
import type { Tier, TierMode } from './types.js';

export type TierProgressInput = {
  tierMode: TierMode;
  tiers: { from: string; rate: string }[];
  /** The period's commissionable revenue so far (service revenue less product charge). */
  commissionableRevenue: string;
};

export type TierProgress = {
  /** The tier the revenue has reached: index into the plan's tiers, its band and rate. */
  currentTier: { index: number; from: string; to: string | null; rate: string };
  /** Null on the plan's top tier. */
  nextTier: { index: number; from: string; rate: string } | null;
  /** Commissionable revenue still needed to reach the next tier's threshold. */
  revenueToNextTier: string | null;
  /** Service commission on the revenue so far, as the period's statement would show it. */
  commission: string;
  /** Service commission once the revenue reaches the next threshold exactly. */
  commissionAtNextTier: string | null;
  /**
   * commissionAtNextTier − commission. Marginal: the current rate on the revenue still needed. Whole period:
   * that plus the rate difference on all of the threshold's revenue, since the new rate applies to everything.
   */
  commissionAdded: string | null;
  /** How far through the current band toward the next threshold, from "0" to "1" (rounded down to 4 places). */
  progress: string;
};

const TIER_MODES: readonly TierMode[] = ['marginal', 'whole-period'];
const INVALID_TIERS = 'pay.invalid_tiers';

function readTiers(value: unknown): Tier[] {
  const raw = readArray(value, 'tiers');
  if (raw.length === 0) throw invalid('tiers', 'tiers must list at least one tier', INVALID_TIERS);
  const tiers = raw.map((entry, i) => {
    const tier = readObject(entry, fieldPath('tiers', i));
    return {
      from: readDecimal(tier.from, fieldPath(fieldPath('tiers', i), 'from')),
      rate: readDecimal(tier.rate, fieldPath(fieldPath('tiers', i), 'rate'), { min: '0', max: '1', code: INVALID_TIERS }),
    };
  });
  tiers.forEach((tier, i) => {
    const from = fieldPath(fieldPath('tiers', i), 'from');
    if (i === 0 && !tier.from.eq(0)) throw invalid(from, `${from} must be "0": the first tier starts at zero`, INVALID_TIERS);
    const previous = tiers[i - 1];
    if (previous && tier.from.lte(previous.from)) {
      throw invalid(from, `${from} must be greater than the tier before it (${previous.from.toFixed()})`, INVALID_TIERS);
    }
  });
  return tiers;
}

/**
 * Where a stylist stands against the plan's commission tiers (common practice in the trade) and what
 * reaching the next tier would be worth. Commission is computed exactly as the period's pay is
 * (tierCommission: bands rounded to the cent, then summed), so the figures agree with the statement.
 */
export function tierProgress(input: TierProgressInput): TierProgress {
  const root = readObject(input, '');
  const tierMode = readChoice(root.tierMode, TIER_MODES, 'tierMode');
  const tiers = readTiers(root.tiers);
  const revenue = readDecimal(root.commissionableRevenue, 'commissionableRevenue');

  const index = tiers.reduce((reached, tier, i) => (revenue.gte(tier.from) ? i : reached), 0);
  const current = tiers[index]!;
  const next = tiers[index + 1];
  const commission = tierCommission(revenue, tiers, tierMode).total;
  const currentTier = { index, from: decimalText(current.from, 2), to: next ? decimalText(next.from, 2) : null, rate: current.rate.toFixed() };
  if (!next) {
    return { currentTier, nextTier: null, revenueToNextTier: null, commission: moneyText(commission), commissionAtNextTier: null, commissionAdded: null, progress: '1' };
  }

  const atNext = tierCommission(next.from, tiers, tierMode).total;
  const band = next.from.minus(current.from);
  const through = revenue.minus(current.from);
  const progress = through.lte(0) ? new Big(0) : through.div(band).round(4, Big.roundDown);
  return {
    currentTier,
    nextTier: { index: index + 1, from: decimalText(next.from, 2), rate: next.rate.toFixed() },
    // Rounded up: a threshold set in fractions of a cent is only reached by the next whole cent.
    revenueToNextTier: next.from.minus(revenue).round(2, Big.roundUp).toFixed(2),
    commission: moneyText(commission),
    commissionAtNextTier: moneyText(atNext),
    commissionAdded: moneyText(atNext.minus(commission)),
    progress: progress.toFixed(),
  };
}
