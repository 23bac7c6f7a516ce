import { subject } from '@casl/ability';
import type { AppAbility } from '../../../lib/ability';
import type { Me } from '../../../lib/session';

/** The CASL subjects the server checks for a staff member of this home branch (staff.policies.ts). */
const staffAt = (user: Me, homeBranchId: string) => subject('Staff', { organisationId: user.organisationId, homeBranchId });
const payAt = (user: Me, homeBranchId: string, staffId?: string) => subject('StaffPay', { organisationId: user.organisationId, homeBranchId, staffId });

export type StaffPermissions = {
  /** Branches where this person may add staff. */
  hiresAt: (homeBranchId: string) => boolean;
  edits: (homeBranchId: string) => boolean;
  /** Setting an hourly rate is a pay change: the owner's alone (DESIGN.md §2). */
  setsPay: (homeBranchId: string, staffId?: string) => boolean;
};

export function staffPermissions(user: Me, ability: AppAbility): StaffPermissions {
  return {
    hiresAt: (homeBranchId) => ability.can('create', staffAt(user, homeBranchId)),
    edits: (homeBranchId) => ability.can('update', staffAt(user, homeBranchId)),
    setsPay: (homeBranchId, staffId) => ability.can('update', payAt(user, homeBranchId, staffId)),
  };
}
