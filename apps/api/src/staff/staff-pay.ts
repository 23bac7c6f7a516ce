import { subject as asSubject } from '@casl/ability';
import type { StaffRow } from '@tressury/schema';
import type { Action, AppAbility } from '../authz/ability.js';

/** Whether the caller may `action` this staff member's pay figures (staff.policies.ts, subject StaffPay). */
export function canOnPay(ability: AppAbility, action: Action, staff: Pick<StaffRow, 'id' | 'organisationId' | 'homeBranchId'>): boolean {
  const target = asSubject('StaffPay', { staffId: staff.id, organisationId: staff.organisationId, homeBranchId: staff.homeBranchId });
  return ability.can(action, target);
}
