import type { DefineRules } from '../authz/ability.js';

// Levels, the service menu and the product catalogue are the organisation's; owners and managers edit them.
export const defineCatalogueRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  can('read', 'Catalogue', inOrganisation);
  if (user.role === 'owner' || user.role === 'manager') can('manage', 'Catalogue', inOrganisation);
};
