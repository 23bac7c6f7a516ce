import type { AbilityBuilder, ForcedSubject, MongoAbility } from '@casl/ability';
import type { AuthUser } from '../auth/auth-user.js';

export const actions = ['manage', 'create', 'read', 'update', 'delete', 'pay', 'close', 'void', 'refund'] as const;
export type Action = (typeof actions)[number];

// The fields CASL conditions may name, per subject; each must map to a column in accessibleBy().
type Records = {
  Organisation: { id: string };
  Branch: { id: string; organisationId: string };
  User: { id: string; organisationId: string };
  Catalogue: { organisationId: string };
  Staff: { id: string; organisationId: string; homeBranchId: string };
  /** Pay figures of a staff member (hourly rate now; earnings and statements with payroll). */
  StaffPay: { staffId: string; organisationId: string; homeBranchId: string };
  /** `servedByStaffIds`: the staff with a service line for this client. */
  Client: { id: string; organisationId: string; homeBranchId: string; servedByStaffIds: string[] };
  /** `staffIds`: the staff with a service line on this ticket. */
  Ticket: { id: string; organisationId: string; branchId: string; staffIds: string[] };
  DayClose: { organisationId: string; branchId: string };
  PayPlan: { organisationId: string };
  /** The pay schedule and its pay periods. */
  PaySchedule: { organisationId: string };
  /** `branchId`: where the hours were worked. */
  Timesheet: { organisationId: string; branchId: string; staffId: string };
  PayrollRun: { organisationId: string };
  /** One staff member's pay in a run; `branchId` is their home branch, `runStatus` the run's status. */
  PayrollLine: { organisationId: string; branchId: string; staffId: string; runStatus: string };
  /** An e-mail the app sent or failed to send (the outbox). */
  OutboundMessage: { organisationId: string };
  /** A branch's figures in the comparison and its franchise fee statements. */
  BranchFigures: { organisationId: string; branchId: string };
};
type Tagged = { [N in keyof Records]: ForcedSubject<N> & Records[N] }[keyof Records];

export type SubjectName = keyof Records | 'all';
export type AppAbility = MongoAbility<[Action, SubjectName | Tagged]>;

/** A feature's rules: each feature adds its own to the builder in `<feature>.policies.ts`. */
export type DefineRules = (user: AuthUser, builder: AbilityBuilder<AppAbility>) => void;
