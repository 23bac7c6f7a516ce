import { parseDecimal } from '@tressury/domain';
import type { Branch } from '../api/branch-queries';
import type { NewBranch } from '../api/use-create-branch';
import type { BranchChanges } from '../api/use-update-branch';

type BranchPayload = Required<NewBranch>;
/**
 * What the form holds: every field as typed, the day count as text until it is sent, and the franchise
 * rates as percentages (the API takes fractions).
 */
export type BranchFormValues = Omit<BranchPayload, 'patchTestMaxAgeDays'> & { patchTestMaxAgeDays: string };
type PercentField = 'royaltyRate' | 'marketingFundRate';
const percentFields: PercentField[] = ['royaltyRate', 'marketingFundRate'];
export type BranchField = keyof BranchFormValues;

// US federal starting points (29 U.S.C. 206, 207); each branch changes them to its local law.
const fresh: BranchFormValues = {
  name: '',
  timeZone: '',
  currency: 'USD',
  minimumWage: '7.25',
  overtimeAfterHours: '40',
  overtimeMultiplier: '1.5',
  commissionExemption: false,
  retailTaxRate: '0',
  varianceNoteThreshold: '5.00',
  patchTestMaxAgeDays: '180',
  royaltyRate: '0',
  marketingFundRate: '0',
};

/** "0.0550" → "5.5": a stored fraction as the percentage a person types, exactly. */
export const percentOf = (fraction: string): string => parseDecimal(fraction, 'fraction').times(100).toFixed();

/** "5.5" → "0.055"; anything that is not a number goes as typed, for the server to refuse by name. */
function fractionOf(percent: string): string {
  try {
    return parseDecimal(percent, 'percent').div(100).toFixed();
  } catch {
    return percent;
  }
}

export function formValuesOf(branch?: Branch): BranchFormValues {
  if (!branch) return { ...fresh };
  const { name, timeZone, currency, minimumWage, overtimeAfterHours, overtimeMultiplier, commissionExemption, retailTaxRate, varianceNoteThreshold } = branch;
  return {
    name,
    timeZone,
    currency,
    minimumWage,
    overtimeAfterHours,
    overtimeMultiplier,
    commissionExemption,
    retailTaxRate,
    varianceNoteThreshold,
    patchTestMaxAgeDays: String(branch.patchTestMaxAgeDays),
    royaltyRate: percentOf(branch.royaltyRate),
    marketingFundRate: percentOf(branch.marketingFundRate),
  };
}

/** A whole number of days goes as a number; anything else as typed, for the server to refuse by name. */
const dayCount = (text: string): number => (/^\d+$/.test(text) ? Number(text) : (text as unknown as number));

export function payloadOf(values: BranchFormValues): BranchPayload {
  return {
    ...values,
    patchTestMaxAgeDays: dayCount(values.patchTestMaxAgeDays),
    royaltyRate: fractionOf(values.royaltyRate),
    marketingFundRate: fractionOf(values.marketingFundRate),
  };
}

/** Only what was changed is sent, so the branch's history records just that. */
export function changesOf(branch: Branch, values: BranchFormValues): BranchChanges {
  const before = formValuesOf(branch);
  const changes: Record<string, unknown> = {};
  for (const field of Object.keys(values) as BranchField[]) {
    if (values[field] === before[field]) continue;
    if (field === 'patchTestMaxAgeDays') changes[field] = dayCount(values[field]);
    else if (percentFields.includes(field as PercentField)) changes[field] = fractionOf(values[field as PercentField]);
    else changes[field] = values[field];
  }
  return changes as BranchChanges;
}

export const isBranchField = (field: string): field is BranchField => field in fresh;
