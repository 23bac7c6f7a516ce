import { packRules } from '@casl/ability/extra';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import type { UserRow } from '@tressury/schema';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { AbilityFactory } from '../authz/ability.factory.js';
import type { AppConfig } from '../config.js';
import { AuthRepository } from './auth.repository.js';
import type { AuthUser } from './auth-user.js';
import type { MeView, SessionView } from './dto/me.view.js';
import type { AccessTokenClaims } from './jwt.strategy.js';

export type IssuedSession = { session: SessionView; refreshToken: string; refreshExpiresAt: Date };

export const hashRefreshToken = (token: string): string => createHash('sha256').update(token).digest('hex');

@Injectable()
export class SessionIssuer {
  constructor(
    private readonly repository: AuthRepository,
    private readonly jwt: JwtService,
    private readonly abilities: AbilityFactory,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  async describe(user: UserRow): Promise<{ authUser: AuthUser; me: MeView }> {
    const myBranches = await this.repository.branchesOf(user);
    const authUser: AuthUser = {
      id: user.id,
      organisationId: user.organisationId,
      role: user.role,
      branchIds: myBranches.map((b) => b.id),
      staffId: user.staffId,
    };
    const me: MeView = {
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
      organisationId: user.organisationId,
      organisationName: await this.repository.organisationName(user.organisationId),
      staffId: user.staffId,
      branches: myBranches,
      rules: packRules(this.abilities.createFor(authUser).rules),
    };
    return { authUser, me };
  }

  /** A new access token and a new single-use refresh token in `familyId` (a new family at sign-in). */
  async issue(user: UserRow, familyId: string = randomUUID()): Promise<IssuedSession> {
    const { authUser, me } = await this.describe(user);
    const expiresIn = this.config.get('accessTokenSeconds', { infer: true });
    const claims: AccessTokenClaims = {
      sub: authUser.id,
      org: authUser.organisationId,
      role: authUser.role,
      branches: authUser.branchIds,
      staff: authUser.staffId,
    };
    const accessToken = await this.jwt.signAsync(claims, { expiresIn, algorithm: 'HS256' });
    const refreshToken = randomBytes(32).toString('base64url');
    const refreshExpiresAt = new Date(Date.now() + this.config.get('refreshTokenDays', { infer: true }) * 86_400_000);
    await this.repository.insertRefreshToken({ userId: user.id, familyId, tokenHash: hashRefreshToken(refreshToken), expiresAt: refreshExpiresAt });
    return { session: { accessToken, expiresIn, user: me }, refreshToken, refreshExpiresAt };
  }
}
