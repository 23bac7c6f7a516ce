import { AbilityBuilder, createMongoAbility } from '@casl/ability';
import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../auth/auth-user.js';
import { defineUserRules } from '../auth/auth.policies.js';
import { defineBranchRules } from '../branches/branches.policies.js';
import { defineOrganisationRules } from '../organisation/organisation.policies.js';
import type { AppAbility, DefineRules } from './ability.js';

const featureRules: DefineRules[] = [defineOrganisationRules, defineBranchRules, defineUserRules];

/** The one place abilities are built; the web receives the same rules packed in /auth/me. */
@Injectable()
export class AbilityFactory {
  createFor(user: AuthUser): AppAbility {
    const builder = new AbilityBuilder<AppAbility>(createMongoAbility);
    for (const define of featureRules) define(user, builder);
    return builder.build();
  }
}
