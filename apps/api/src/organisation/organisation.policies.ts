import type { DefineRules } from '../authz/ability.js';

export const defineOrganisationRules: DefineRules = (user, { can }) => {
  can('read', 'Organisation', { id: user.organisationId });
  if (user.role === 'owner') can('update', 'Organisation', { id: user.organisationId });
};
