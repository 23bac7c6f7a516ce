import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { payrollRunQueries } from './payroll-run-queries';

export type PayPlan = components['schemas']['PayPlanView'];
export type PayPlanVersion = components['schemas']['PayPlanVersionView'];
export type PayPlanTerms = components['schemas']['PayPlanTermsDto'];
export type PaySchedule = components['schemas']['PayScheduleView'];
export type PlanStaffMember = components['schemas']['StaffView'];
export type { PayPeriod, PayPeriods } from './payroll-run-queries';

export const payPlanKeys = {
  /** The payroll feature's root: the pay schedule moves every period and run under it. */
  feature: ['payroll'] as const,
  all: ['payroll', 'plans'] as const,
  list: () => [...payPlanKeys.all, 'list'] as const,
  staff: () => [...payPlanKeys.all, 'staff'] as const,
};

export const payPlanQueries = {
  list: () =>
    queryOptions({
      queryKey: payPlanKeys.list(),
      queryFn: () => expectData(http.GET('/api/payroll/plans')),
    }),
  /** Everyone who could be put on a plan, with their home branch (the staff list, read for names only). */
  staff: () =>
    queryOptions({
      queryKey: payPlanKeys.staff(),
      queryFn: () => expectData(http.GET('/api/staff', { params: { query: {} } })),
    }),
  /** The schedule and the periods, shared with the payroll run screens. */
  periods: payrollRunQueries.periods,
};
