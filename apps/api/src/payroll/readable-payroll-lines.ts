import { payrollLines, payrollRuns } from '@tressury/schema';
import type { SQL } from 'drizzle-orm';
import type { AppAbility } from '../authz/ability.js';
import { accessibleBy } from '../authz/accessible-by.js';

/** The payroll lines the caller may read; the query must join payroll_runs for the run's status. */
export const readablePayrollLines = (ability: AppAbility): SQL =>
  accessibleBy(ability, 'read', 'PayrollLine', {
    organisationId: payrollLines.organisationId,
    branchId: payrollLines.branchId,
    staffId: payrollLines.staffId,
    runStatus: payrollRuns.status,
  });
