import { DomainError } from '@tressury/domain';

export const payPlanNotFound = () => new DomainError('pay_plan.not_found', 'No such pay plan.', 'not_found');
export const payPlanNameTaken = (name: string) =>
  new DomainError('pay_plan.name_taken', `A pay plan called "${name}" already exists.`, 'conflict', 'name');
export const payPlanVersionExists = (date: string) =>
  new DomainError('pay_plan.version_exists', `The plan already has terms starting on ${date}.`, 'conflict', 'effectiveFrom');
export const termsBeforeFrozen = (date: string, frozenThrough: string) =>
  new DomainError(
    'pay_plan.period_frozen',
    `Payroll is approved through ${frozenThrough}; plan changes can start from the next pay period, not ${date}.`,
    'conflict',
    'effectiveFrom',
  );
export const staffNotFound = (field = 'staffId') => new DomainError('staff.not_found', 'No such staff member.', 'not_found', field);
export const branchNotFound = (field = 'branchId') => new DomainError('branch.not_found', 'No such branch.', 'not_found', field);
export const assignmentExists = (date: string) =>
  new DomainError('pay_plan.assignment_exists', `The staff member already has a plan assigned from ${date}.`, 'conflict', 'effectiveFrom');

export const scheduleMissing = () =>
  new DomainError('pay_schedule.missing', 'Set the pay schedule (frequency and anchor date) first.', 'conflict');
export const scheduleInUse = () =>
  new DomainError('pay_schedule.in_use', 'Pay periods already exist; the schedule can no longer change.', 'conflict');
export const notPeriodStart = (date: string, field: string) =>
  new DomainError('pay_period.not_a_start', `${date} is not the first day of a pay period under the pay schedule.`, 'invalid', field);
export const payPeriodNotFound = () => new DomainError('pay_period.not_found', 'No such pay period.', 'not_found');
export const payPeriodExists = (start: string) =>
  new DomainError('pay_period.exists', `The pay period starting ${start} already exists.`, 'conflict');

export const payrollRunNotFound = () => new DomainError('payroll_run.not_found', 'No such payroll run.', 'not_found');
export const payrollLineNotFound = () => new DomainError('payroll_line.not_found', 'No such payroll line.', 'not_found');
export const payrollRunFrozen = (status: string) =>
  new DomainError('payroll_run.frozen', `The payroll run is ${status}: its figures are frozen and can no longer change.`, 'conflict');
export const payrollRunBusy = () =>
  new DomainError('payroll_run.computing', 'The payroll run is still being computed; wait for it to finish.', 'conflict');
export const payrollRunNotDraft = (status: string) =>
  new DomainError('payroll_run.not_draft', `Only a finished draft can be approved; this run is ${status}.`, 'conflict');
export const payrollRunNotApproved = () =>
  new DomainError('payroll_run.not_approved', 'Approve the payroll run before exporting it.', 'conflict');
export const periodFrozen = (date: string) =>
  new DomainError('payroll_run.frozen', `${date} falls in a pay period whose payroll is approved: its hours can no longer change.`, 'conflict', 'date');
