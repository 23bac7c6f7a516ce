import type { Role } from '@tressury/schema';

/** Who is calling: read from the access token, so any API instance can serve any request. */
export type AuthUser = {
  id: string;
  organisationId: string;
  role: Role;
  branchIds: string[];
  staffId: string | null;
};
