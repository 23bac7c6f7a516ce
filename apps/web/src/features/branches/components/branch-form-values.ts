import type { Branch } from '../api/branch-queries';
import type { NewBranch } from '../api/use-create-branch';
import type { BranchChanges } from '../api/use-update-branch';

type BranchPayload = Required<NewBranch>;
/** What the form holds: every field as typed, the day count as text until it is sent. */
export type BranchFormValues = Omit<BranchPayload, 'patchTestMaxAgeDays'> & { patchTestMaxAgeDays: string };
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
};

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
  };
}

/** A whole number of days goes as a number; anything else as typed, for the server to refuse by name. */
const dayCount = (text: string): number => (/^\d+$/.test(text) ? Number(text) : (text as unknown as number));

export function payloadOf(values: BranchFormValues): BranchPayload {
  return { ...values, patchTestMaxAgeDays: dayCount(values.patchTestMaxAgeDays) };
}

/** Only what was changed is sent, so the branch's history records just that. */
export function changesOf(branch: Branch, values: BranchFormValues): BranchChanges {
  const before = formValuesOf(branch);
  const changes: Record<string, unknown> = {};
  for (const field of Object.keys(values) as BranchField[]) {
    if (values[field] !== before[field]) changes[field] = field === 'patchTestMaxAgeDays' ? dayCount(values[field]) : values[field];
  }
  return changes as BranchChanges;
}

export const isBranchField = (field: string): field is BranchField => field in fresh;
