import type { DefineRules } from '../authz/ability.js';

// DESIGN.md §2: the owner sets plans and approves; the accountant runs, reviews, approves and exports and
// reads every pay figure; a manager enters hours for their branches and reads their branch's drafts;
// a stylist reads only her own lines.
export const definePayrollRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  const inMyBranches = { ...inOrganisation, branchId: { $in: user.branchIds } };
  // The pay calendar holds no pay figures: everyone may see it.
  can('read', 'PaySchedule', inOrganisation);
  switch (user.role) {
    case 'owner':
      can('manage', 'PayPlan', inOrganisation);
      can('manage', 'PaySchedule', inOrganisation);
      can('manage', 'Timesheet', inOrganisation);
      can('manage', 'PayrollRun', inOrganisation);
      can('read', 'PayrollLine', inOrganisation);
      break;
    case 'accountant':
      can('read', 'PayPlan', inOrganisation);
      can('create', 'PaySchedule', inOrganisation);
      can('read', 'Timesheet', inOrganisation);
      can('manage', 'PayrollRun', inOrganisation);
      can('read', 'PayrollLine', inOrganisation);
      break;
    case 'manager':
      can('manage', 'Timesheet', inMyBranches);
      can('read', 'PayrollRun', inOrganisation);
      can('read', 'PayrollLine', { ...inMyBranches, runStatus: 'draft' });
      break;
    case 'stylist':
      if (user.staffId) {
        can('read', 'Timesheet', { ...inOrganisation, staffId: user.staffId });
        can('read', 'PayrollLine', { ...inOrganisation, staffId: user.staffId });
      }
      break;
    case 'front_desk':
      break;
  }
};
