import { AbilityBuilder, createMongoAbility } from '@casl/ability';
import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../auth/auth-user.js';
import { defineUserRules } from '../auth/auth.policies.js';
import { defineBranchRules } from '../branches/branches.policies.js';
import { defineCatalogueRules } from '../catalogue/catalogue.policies.js';
import { defineClientRules } from '../clients/clients.policies.js';
import { defineCompareRules } from '../compare/compare.policies.js';
import { defineDayCloseRules } from '../day-close/day-close.policies.js';
import { defineMailRules } from '../mail/mail.policies.js';
import { definePayrollRules } from '../payroll/payroll.policies.js';
import { defineStaffRules } from '../staff/staff.policies.js';
import { defineTicketRules } from '../tickets/tickets.policies.js';
import { defineOrganisationRules } from '../organisation/organisation.policies.js';
import type { AppAbility, DefineRules } from './ability.js';

const featureRules: DefineRules[] = [
  defineOrganisationRules,
  defineBranchRules,
  defineUserRules,
  defineCatalogueRules,
  defineStaffRules,
  defineClientRules,
  defineTicketRules,
  defineDayCloseRules,
  definePayrollRules,
  defineMailRules,
  defineCompareRules,
];

/** The one place abilities are built; the web receives the same rules packed in /auth/me. */
@Injectable()
export class AbilityFactory {
  createFor(user: AuthUser): AppAbility {
    const builder = new AbilityBuilder<AppAbility>(createMongoAbility);
    for (const define of featureRules) define(user, builder);
    return builder.build();
  }
}
