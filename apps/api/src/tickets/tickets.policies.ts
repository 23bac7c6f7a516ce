import type { DefineRules } from '../authz/ability.js';

// DESIGN.md §2. 'update' covers lines, bowls, retail, tips; 'pay' taking payments; 'close' checkout;
// 'void' and 'refund' are the manager's. Accountants read for payroll and never edit tickets.
export const defineTicketRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  const inMyBranches = { ...inOrganisation, branchId: { $in: user.branchIds } };
  switch (user.role) {
    case 'owner':
      can(['read', 'create', 'update', 'pay', 'close', 'void', 'refund'], 'Ticket', inOrganisation);
      break;
    case 'manager':
      can(['read', 'create', 'update', 'pay', 'close', 'void', 'refund'], 'Ticket', inMyBranches);
      break;
    case 'front_desk':
      can(['read', 'create', 'update', 'pay', 'close'], 'Ticket', inMyBranches);
      break;
    case 'stylist':
      if (user.staffId) can(['read', 'update'], 'Ticket', { ...inMyBranches, staffIds: user.staffId });
      break;
    case 'accountant':
      can('read', 'Ticket', inOrganisation);
      break;
  }
};
