import type { OrganisationRow } from '@tressury/schema';

export class OrganisationView {
  id: string;
  name: string;
  updatedAt: string;
}

export const toOrganisationView = (row: OrganisationRow): OrganisationView => ({
  id: row.id,
  name: row.name,
  updatedAt: row.updatedAt.toISOString(),
});
