import { staff } from '@tressury/schema';
import type { SQL } from 'drizzle-orm';
import type { AppAbility } from '../authz/ability.js';
import { accessibleBy } from '../authz/accessible-by.js';

/** The staff rows the caller may read, by the same CASL rules that guard one record. */
export const readableStaff = (ability: AppAbility): SQL =>
  accessibleBy(ability, 'read', 'Staff', { id: staff.id, organisationId: staff.organisationId, homeBranchId: staff.homeBranchId });
