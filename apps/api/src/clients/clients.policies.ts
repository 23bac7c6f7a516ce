import { branches, clients, type Role } from '@tressury/schema';
import { sql } from 'drizzle-orm';
import type { DefineRules } from '../authz/ability.js';
import type { FieldMap } from '../authz/accessible-by.js';

// Front desk and managers keep the clients of their branches; a stylist reads the clients they serve.
export const defineClientRules: DefineRules = (user, { can }) => {
  const inOrganisation = { organisationId: user.organisationId };
  switch (user.role) {
    case 'owner':
      can('manage', 'Client', inOrganisation);
      break;
    case 'manager':
    case 'front_desk':
      can('manage', 'Client', { ...inOrganisation, homeBranchId: { $in: user.branchIds } });
      break;
    case 'stylist':
      if (user.staffId) can('read', 'Client', { ...inOrganisation, servedByStaffIds: user.staffId });
      break;
    case 'accountant':
      break;
  }
};

/** The Client condition fields in SQL over `clients`, for accessibleBy(). */
export const clientColumns: FieldMap = {
  id: clients.id,
  organisationId: clients.organisationId,
  homeBranchId: clients.homeBranchId,
  // A staff member "serves" a client once they have a service line on one of the client's tickets.
  servedByStaffIds: (operator, value) => {
    if (operator !== 'eq') throw new Error(`Client.servedByStaffIds has no SQL translation for the CASL operator ${operator}`);
    return sql`exists (select 1 from tickets t join ticket_service_lines l on l.ticket_id = t.id where t.client_id = ${clients.id} and l.staff_id = ${value})`;
  },
};

/** The Branch condition fields, for choosing a client's home branch among the caller's. */
export const branchColumns: FieldMap = { id: branches.id, organisationId: branches.organisationId };

/** Product cost is not a pay figure, but front desk and stylists have no use for it (DESIGN.md §2). */
export const seesBowlCosts = (role: Role): boolean => role === 'owner' || role === 'manager' || role === 'accountant';
