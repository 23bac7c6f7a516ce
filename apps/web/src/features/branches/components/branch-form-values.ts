import type { Branch } from '../api/branch-queries';
import type { NewBranch } from '../api/use-create-branch';
import type { BranchChanges } from '../api/use-update-branch';

export type BranchFormValues = Required<NewBranch>;
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
};

export function formValuesOf(branch?: Branch): BranchFormValues {
  if (!branch) return { ...fresh };
  const { name, timeZone, currency, minimumWage, overtimeAfterHours, overtimeMultiplier, commissionExemption, retailTaxRate } = branch;
  return { name, timeZone, currency, minimumWage, overtimeAfterHours, overtimeMultiplier, commissionExemption, retailTaxRate };
}

/** Only what was changed is sent, so the branch's history records just that. */
export function changesOf(branch: Branch, values: BranchFormValues): BranchChanges {
  const before = formValuesOf(branch);
  const changes: Record<string, unknown> = {};
  for (const field of Object.keys(values) as BranchField[]) {
    if (values[field] !== before[field]) changes[field] = values[field];
  }
  return changes as BranchChanges;
}

export const isBranchField = (field: string): field is BranchField => field in fresh;
