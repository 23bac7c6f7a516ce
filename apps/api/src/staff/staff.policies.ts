import type { DefineRules } from '../authz/ability.js';

// DESIGN.md §2: managers run the staff of their branches; pay figures are never shown to front desk,
// and a stylist sees only their own.
export const defineStaffRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  const inMyBranches = { ...inOrganisation, homeBranchId: { $in: user.branchIds } };
  switch (user.role) {
    case 'owner':
      can('manage', 'Staff', inOrganisation);
      can('manage', 'StaffPay', inOrganisation);
      break;
    case 'accountant':
      can('read', 'Staff', inOrganisation);
      can('read', 'StaffPay', inOrganisation);
      break;
    case 'manager':
      can('manage', 'Staff', inMyBranches);
      can('read', 'StaffPay', inMyBranches);
      break;
    case 'front_desk':
      can('read', 'Staff', inMyBranches);
      break;
    case 'stylist':
      can('read', 'Staff', inMyBranches);
      if (user.staffId) can('read', 'StaffPay', { ...inOrganisation, staffId: user.staffId });
      break;
  }
};
