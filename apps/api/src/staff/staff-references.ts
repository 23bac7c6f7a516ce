import { subject as asSubject } from '@casl/ability';
import type { AuthUser } from '../auth/auth-user.js';
import type { Action, AppAbility } from '../authz/ability.js';
import { type FieldProblem, ValidationFailedError } from '../common/validation-failed.error.js';
import { userAlreadyLinked } from './staff-errors.js';
import type { StaffRepository } from './staff.repository.js';

export type StaffReferences = { staffId: string | null; homeBranchId: string; levelId?: string; userId?: string | null };

/**
 * Checks what a staff record points to: a branch of the organisation where the caller may `action`
 * staff, a level of the organisation, and a stylist's sign-in assigned to the home branch and not
 * linked to someone else. Unknown and out-of-scope ids get the same answer, naming the field.
 */
export async function checkStaffReferences(
  repository: StaffRepository,
  ability: AppAbility,
  user: AuthUser,
  action: Action,
  refs: StaffReferences,
): Promise<void> {
  const problems: FieldProblem[] = [];
  const { organisationId } = user;
  const target = asSubject('Staff', { id: refs.staffId ?? '', organisationId, homeBranchId: refs.homeBranchId });
  if (!(await repository.branchInOrganisation(organisationId, refs.homeBranchId)) || !ability.can(action, target)) {
    problems.push({ field: 'homeBranchId', message: 'homeBranchId must be a branch where you manage staff' });
  }
  if (refs.levelId !== undefined && !(await repository.levelInOrganisation(organisationId, refs.levelId))) {
    problems.push({ field: 'levelId', message: 'levelId must be a level of this organisation' });
  }
  let linkedElsewhere = false;
  if (refs.userId) {
    const linked = await repository.findUser(organisationId, refs.userId);
    if (!linked || linked.role !== 'stylist' || !linked.branchIds.includes(refs.homeBranchId)) {
      problems.push({ field: 'userId', message: "userId must be a stylist's sign-in assigned to the staff member's home branch" });
    } else if (linked.staffId !== null && linked.staffId !== refs.staffId) {
      linkedElsewhere = true;
    }
  }
  if (problems.length > 0) throw new ValidationFailedError(problems);
  if (linkedElsewhere) throw userAlreadyLinked();
}
