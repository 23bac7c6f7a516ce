import type { DefineRules } from '../authz/ability.js';

// The manager closes the day; the owner may too. Accountants read closes for payroll.
export const defineDayCloseRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  switch (user.role) {
    case 'owner':
      can('manage', 'DayClose', inOrganisation);
      break;
    case 'manager':
      can('manage', 'DayClose', { ...inOrganisation, branchId: { $in: user.branchIds } });
      break;
    case 'accountant':
      can('read', 'DayClose', inOrganisation);
      break;
    default:
      break;
  }
};
