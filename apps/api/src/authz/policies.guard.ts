import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { AuthUser } from '../auth/auth-user.js';
import { AbilityFactory } from './ability.factory.js';
import { CHECK_POLICIES, type PolicyCheck } from './check-policies.decorator.js';
import { refusal } from './refusal.js';

@Injectable()
export class PoliciesGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly abilities: AbilityFactory,
  ) {}

  canActivate(context: ExecutionContext): boolean {
    const check = this.reflector.getAllAndOverride<PolicyCheck | undefined>(CHECK_POLICIES, [context.getHandler(), context.getClass()]);
    if (!check) return true;
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (!user) return true; // public route: the JWT guard has already decided
    if (this.abilities.createFor(user).can(check.action, check.subject)) return true;
    throw refusal(user.role, check.action, check.subject);
  }
}
