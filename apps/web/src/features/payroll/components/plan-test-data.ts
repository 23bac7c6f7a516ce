import type { Me } from '../../../lib/session';
import { ownerMe } from '../../../test/sessions';
import type { PayPeriods, PayPlan, PlanStaffMember } from '../api/pay-plan-queries';

const organisationId = ownerMe.organisationId;
const [elmstead, quarry] = ownerMe.branches as [Me['branches'][number], Me['branches'][number]];

// Rules as the API packs them (payroll.policies.ts, staff.policies.ts).
export const planOwnerMe: Me = {
  ...ownerMe,
  rules: [
    ...ownerMe.rules,
    ['read', 'PaySchedule', { organisationId }],
    ['manage', 'PayPlan', { organisationId }],
    ['manage', 'PaySchedule', { organisationId }],
    ['manage', 'PayrollRun', { organisationId }],
    ['manage', 'Timesheet', { organisationId }],
    ['manage', 'Staff', { organisationId }],
  ],
};

export const planAccountantMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000005',
  role: 'accountant',
  displayName: 'Wilhelmina Crane-Osei',
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['read', 'PaySchedule', { organisationId }],
    ['read', 'PayPlan', { organisationId }],
    ['create', 'PaySchedule', { organisationId }],
    ['read', 'Timesheet', { organisationId }],
    ['manage', 'PayrollRun', { organisationId }],
    ['read', 'Staff', { organisationId }],
  ],
};

const staffRow = (n: number, displayName: string, branch: typeof elmstead, active = true): PlanStaffMember => ({
  id: `57aff000-0000-4000-8000-00000000000${n}`,
  displayName,
  email: null,
  levelId: '1e7e1000-0000-4000-8000-000000000001',
  levelName: 'Emerging',
  homeBranchId: branch.id,
  homeBranchName: branch.name,
  userId: null,
  active,
  hourlyRate: null,
  createdAt: '2026-01-05T15:00:00.000Z',
  updatedAt: '2026-01-05T15:00:00.000Z',
});

export const planStaff: PlanStaffMember[] = [
  staffRow(1, 'Jorunn Aldersey', elmstead),
  staffRow(2, 'Tamsin Okonkwo-Reyes', elmstead),
  staffRow(3, 'Bartholomew Quill', quarry),
];

// Invented terms in the shape the trade uses (common practice): 35 / 40 / 45 % bands, colour product at cost + 10 %.
export const standardPlan: PayPlan = {
  id: '9a9e0000-0000-4000-8000-000000000001',
  name: 'Standard',
  versions: [
    {
      id: '9a9e0000-0000-4000-8000-0000000000a1',
      effectiveFrom: '2026-02-02',
      tierMode: 'marginal',
      tiers: [
        { from: '0', rate: '0.35' },
        { from: '1500', rate: '0.4' },
        { from: '3000', rate: '0.45' },
      ],
      productCharge: { mode: 'actual-cost', value: null, markup: '0.1' },
      retailRate: '0.1',
      hourlyRate: null,
    },
  ],
  assignments: [
    { staffId: planStaff[0]!.id, effectiveFrom: '2026-02-02' },
    { staffId: planStaff[1]!.id, effectiveFrom: '2026-03-16' },
  ],
};

/** Today falls in the period from 2 March; the one from 16 February is approved, so nothing may start before 2 March. */
export const calendar: PayPeriods = {
  schedule: { frequency: 'biweekly', anchorDate: '2026-02-02', workweekStartsOn: 0 },
  current: { startDate: '2026-03-02', endDate: '2026-03-15' },
  next: { startDate: '2026-03-16', endDate: '2026-03-29' },
  periods: [
    { id: 'fe110000-0000-4000-8000-000000000002', startDate: '2026-03-02', endDate: '2026-03-15', runId: 'a0000000-0000-4000-8000-000000000002', runStatus: 'draft' },
    { id: 'fe110000-0000-4000-8000-000000000001', startDate: '2026-02-16', endDate: '2026-03-01', runId: 'a0000000-0000-4000-8000-000000000001', runStatus: 'approved' },
  ],
};

export const unscheduled: PayPeriods = { schedule: null, current: null, next: null, periods: [] };
