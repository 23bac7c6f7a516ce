import type { DefineRules } from '../authz/ability.js';

export const defineUserRules: DefineRules = (user, { can }) => {
  can('read', 'User', { id: user.id });
  if (user.role === 'owner') can('manage', 'User', { organisationId: user.organisationId });
};
