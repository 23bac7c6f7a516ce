import { createMongoAbility, type ForcedSubject, type MongoAbility, type RawRuleOf } from '@casl/ability';
import { type PackRule, unpackRules } from '@casl/ability/extra';
import { createContext, use } from 'react';
import type { Me } from './session';

// The names the server's ability factory uses (DESIGN.md §2); the rules themselves come packed in /auth/me.
export type Action = 'manage' | 'create' | 'read' | 'update' | 'delete' | 'pay' | 'close' | 'void' | 'refund';
export type Subject = 'Organisation' | 'Branch' | 'User' | 'Catalogue' | 'Staff' | 'StaffPay' | 'Client' | 'Ticket' | 'DayClose' | 'PayPlan' | 'PaySchedule' | 'PayrollRun' | 'PayrollLine' | 'Timesheet' | 'BranchFigures' | 'OutboundMessage' | 'all';
/** A loaded record tagged with `subject('Ticket', record)`, so rules with conditions are checked against it. */
export type TaggedRecord = ForcedSubject<Exclude<Subject, 'all'>>;
export type AppAbility = MongoAbility<[Action, Subject | TaggedRecord]>;

const abilities = new WeakMap<Me, AppAbility>();

export function abilityFor(user: Me): AppAbility {
  let ability = abilities.get(user);
  if (!ability) {
    ability = createMongoAbility<AppAbility>(unpackRules(user.rules as PackRule<RawRuleOf<AppAbility>>[]));
    abilities.set(user, ability);
  }
  return ability;
}

export const AbilityContext = createContext<AppAbility>(createMongoAbility<AppAbility>());

export function useAbility(): AppAbility {
  return use(AbilityContext);
}
