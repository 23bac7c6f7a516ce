import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { roles, type Role } from '@tressury/schema';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { AppConfig } from '../config.js';
import type { AuthUser } from './auth-user.js';

export type AccessTokenClaims = { sub: string; org: string; role: Role; branches: string[]; staff: string | null };

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(config: ConfigService<AppConfig, true>) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.get('jwtSecret', { infer: true }),
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  validate(claims: AccessTokenClaims): AuthUser | false {
    if (!roles.includes(claims.role) || !Array.isArray(claims.branches)) return false;
    return { id: claims.sub, organisationId: claims.org, role: claims.role, branchIds: claims.branches, staffId: claims.staff ?? null };
  }
}
