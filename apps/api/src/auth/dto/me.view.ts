import { roles, type Role } from '@tressury/schema';
import { ApiProperty } from '@nestjs/swagger';

export class MyBranchView {
  id: string;
  name: string;
  timeZone: string;
  currency: string;
}

export class MeView {
  id: string;
  email: string;
  displayName: string;
  @ApiProperty({ enum: roles, enumName: 'Role' })
  role: Role;
  organisationId: string;
  organisationName: string;
  /** The staff record of a stylist (null for roles without one). */
  staffId: string | null;
  /** The branches this user works in (every branch for owners and accountants). */
  branches: MyBranchView[];
  /** The caller's CASL rules, packed with @casl/ability/extra packRules, so the web shows what the server allows. */
  @ApiProperty({ type: 'array', items: { type: 'array', items: {} } })
  rules: unknown[];
}

export class SessionView {
  /** Bearer token for the Authorization header. */
  accessToken: string;
  /** Seconds until the access token expires; refresh before then. */
  expiresIn: number;
  user: MeView;
}
