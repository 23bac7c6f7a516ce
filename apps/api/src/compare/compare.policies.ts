import type { DefineRules } from '../authz/ability.js';

// Issue 6: owners and accountants compare every branch; a manager only the branches assigned to them.
export const defineCompareRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  switch (user.role) {
    case 'owner':
    case 'accountant':
      can('read', 'BranchFigures', inOrganisation);
      break;
    case 'manager':
      can('read', 'BranchFigures', { ...inOrganisation, branchId: { $in: user.branchIds } });
      break;
  }
};
