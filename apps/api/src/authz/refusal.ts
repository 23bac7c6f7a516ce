import { subject as asSubject } from '@casl/ability';
import { DomainError } from '@tressury/domain';
import type { Role } from '@tressury/schema';
import type { Action, AppAbility, SubjectName } from './ability.js';

const roleLabel: Record<Role, string> = {
  owner: 'An owner',
  manager: 'A manager',
  front_desk: 'Front desk',
  stylist: 'A stylist',
  accountant: 'An accountant',
};

const actionLabel: Record<Action, string> = {
  manage: 'manage',
  create: 'create',
  read: 'see',
  update: 'change',
  delete: 'delete',
  pay: 'take payments on',
  close: 'close',
  void: 'void',
  refund: 'refund',
};

const subjectLabel: Record<SubjectName, string> = {
  Organisation: 'the organisation settings',
  Branch: 'branches',
  User: 'user accounts',
  Catalogue: 'the service menu and product catalogue',
  Staff: 'staff records',
  StaffPay: 'pay figures',
  Client: 'client records',
  Ticket: 'tickets',
  DayClose: 'day closes',
  PayPlan: 'pay plans',
  PaySchedule: 'the pay schedule and pay periods',
  Timesheet: 'timesheet hours',
  PayrollRun: 'payroll runs',
  PayrollLine: 'payroll figures',
  OutboundMessage: 'mail sent by the app',
  BranchFigures: 'branch figures and fee statements',
  all: 'this',
};

export function refusal(role: Role, action: Action, subjectName: SubjectName): DomainError {
  return new DomainError('auth.forbidden', `${roleLabel[role]} may not ${actionLabel[action]} ${subjectLabel[subjectName]}.`, 'forbidden');
}

/**
 * Checks a loaded record: outside the caller's reading scope it does not exist for them (404);
 * readable but not allowed for this action, it is refused (403).
 */
export function assertCan(
  ability: AppAbility,
  role: Role,
  action: Action,
  subjectName: Exclude<SubjectName, 'all'>,
  record: Record<string, unknown>,
  notFound: () => DomainError,
): void {
  // The loaded row carries every field the conditions name; CASL only reads those.
  const target = asSubject(subjectName, { ...record }) as unknown as Parameters<AppAbility['can']>[1];
  if (!ability.can('read', target)) throw notFound();
  if (!ability.can(action, target)) throw refusal(role, action, subjectName);
}
