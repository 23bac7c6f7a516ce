import type { DefineRules } from '../authz/ability.js';

// DESIGN.md §2: owners run every branch; accountants read all; everyone else sees the branches assigned to them.
export const defineBranchRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  switch (user.role) {
    case 'owner':
      can('manage', 'Branch', inOrganisation);
      break;
    case 'accountant':
      can('read', 'Branch', inOrganisation);
      break;
    default:
      can('read', 'Branch', { ...inOrganisation, id: { $in: user.branchIds } });
  }
};
