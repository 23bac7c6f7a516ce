import type { Me } from '../../../lib/session';
import { ownerMe } from '../../../test/sessions';
import type { PayPeriods, PayrollLine, PayrollLineDetail, PayrollRun } from '../api/payroll-run-queries';
import type { StaffMember, TimesheetEntry } from '../api/timesheet-queries';

const organisationId = ownerMe.organisationId;
const [elmstead, quarry] = ownerMe.branches as [Me['branches'][number], Me['branches'][number]];
export { elmstead, quarry };

// Rules as the API packs them (payroll.policies.ts, staff.policies.ts).
export const runAccountantMe: Me = {
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
    ['read', 'PayrollLine', { organisationId }],
    ['read', 'Staff', { organisationId }],
  ],
};

export const runManagerMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000002',
  role: 'manager',
  displayName: 'Oswin Pell',
  branches: [elmstead],
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['read', 'PaySchedule', { organisationId }],
    ['manage', 'Timesheet', { organisationId, branchId: { $in: [elmstead.id] } }],
    ['read', 'PayrollRun', { organisationId }],
    ['read', 'PayrollLine', { organisationId, branchId: { $in: [elmstead.id] }, runStatus: 'draft' }],
    ['manage', 'Staff', { organisationId, homeBranchId: { $in: [elmstead.id] } }],
  ],
};

export const periodId = 'e710d000-0000-4000-8000-000000000001';
export const runId = '7a11c000-0000-4000-8000-000000000001';

export const periodsWith = (runStatus: PayrollRun['status'] | null): PayPeriods => ({
  schedule: { frequency: 'biweekly', anchorDate: '2026-02-15', workweekStartsOn: 0 },
  current: { startDate: '2026-03-15', endDate: '2026-03-28' },
  next: { startDate: '2026-03-15', endDate: '2026-03-28' },
  periods: [{ id: periodId, startDate: '2026-03-01', endDate: '2026-03-14', runId: runStatus ? runId : null, runStatus }],
});

export const run = (overrides: Partial<PayrollRun> = {}): PayrollRun => ({
  id: runId,
  periodId,
  startDate: '2026-03-01',
  endDate: '2026-03-14',
  status: 'draft',
  totalStaff: 3,
  processedStaff: 3,
  error: null,
  stalled: false,
  startedAt: '2026-03-16T14:00:00.000Z',
  completedAt: '2026-03-16T14:00:04.000Z',
  approvedAt: null,
  exportedAt: null,
  ...overrides,
});

const zero = '0.00';
const line = (n: number, staffName: string, figures: Partial<PayrollLine>): PayrollLine => ({
  id: `11e00000-0000-4000-8000-00000000000${n}`,
  runId,
  staffId: `57aff000-0000-4000-8000-00000000000${n}`,
  staffName,
  branchId: elmstead.id,
  branchName: elmstead.name,
  hours: '0',
  serviceRevenue: zero,
  productCharge: zero,
  commissionableRevenue: zero,
  serviceCommission: zero,
  retailCommission: zero,
  hourlyPay: zero,
  tips: zero,
  minimumWageTopUp: zero,
  overtimePremium: zero,
  grossPay: zero,
  ...figures,
});

// Invented staff of the invented Fernhollow group; figures chosen so that each flag shows once.
export const lines: PayrollLine[] = [
  line(1, 'Wren Halloway', {
    hours: '86.5',
    serviceRevenue: '4210.00',
    productCharge: '318.45',
    commissionableRevenue: '3891.55',
    serviceCommission: '1656.20',
    retailCommission: '42.15',
    tips: '388.00',
    overtimePremium: '65.17',
    grossPay: '2151.52',
  }),
  line(2, 'Tamsin Greaves', {
    hours: '61.25',
    serviceRevenue: '705.00',
    productCharge: '48.10',
    commissionableRevenue: '656.90',
    serviceCommission: '229.92',
    retailCommission: '6.30',
    tips: '54.00',
    minimumWageTopUp: '207.84',
    grossPay: '498.06',
  }),
  line(3, 'Ottoline Brask', {
    hours: '12.125',
    serviceRevenue: '-140.00',
    commissionableRevenue: '-140.00',
    serviceCommission: '-49.00',
    minimumWageTopUp: '136.91',
    grossPay: '87.91',
  }),
];

export const wrenDetail: PayrollLineDetail = {
  ...lines[0]!,
  input: {
    plan: {
      tierMode: 'marginal',
      tiers: [
        { from: '0', rate: '0.40' },
        { from: '3000', rate: '0.45' },
      ],
      productCharge: { mode: 'actual-cost', markup: '0.10' },
      retailRate: '0.10',
    },
    serviceLines: [
      { id: '5e000000-0000-4000-8000-000000000001', date: '2026-03-03', price: '185.00', isColour: true, productCost: '21.40' },
      { id: '5e000000-0000-4000-8000-000000000002', date: '2026-03-04', price: '65.00', isColour: false, productCost: '0.00' },
    ],
    productChargeAdjustments: [{ id: 'adjustment:ad000000-0000-4000-8000-000000000001', date: '2026-03-06', amount: '3.40' }],
    retailLines: [{ id: 'ae000000-0000-4000-8000-000000000001', date: '2026-03-05', amount: '42.00' }],
    tips: [{ date: '2026-03-03', amount: '30.00' }],
    hours: [
      { date: '2026-03-02', hours: '9.5' },
      { date: '2026-03-03', hours: '8' },
    ],
    wageRules: { minimumWage: '7.25', overtimeAfterHours: '40', overtimeMultiplier: '1.5', workweekStartsOn: 0, commissionExemption: false },
  },
  result: {
    serviceRevenue: '4210.00',
    productCharge: '318.45',
    commissionableRevenue: '3891.55',
    tierBreakdown: [
      { from: '0', to: '3000', rate: '0.40', base: '3000.00', commission: '1200.00' },
      { from: '3000', to: null, rate: '0.45', base: '891.55', commission: '401.20' },
    ],
    serviceCommission: '1656.20',
    retailCommission: '42.15',
    hourlyPay: '0.00',
    tips: '388.00',
    workweeks: [
      {
        start: '2026-03-01',
        hours: '46.5',
        earnings: '932.40',
        regularRate: '20.05',
        minimumWageTopUp: '0.00',
        overtimeHours: '6.5',
        overtimePremium: '65.17',
        exempt: false,
      },
      {
        start: '2026-03-08',
        hours: '40',
        earnings: '766.00',
        regularRate: '19.15',
        minimumWageTopUp: '0.00',
        overtimeHours: '0',
        overtimePremium: '0.00',
        exempt: false,
      },
    ],
    minimumWageTopUp: '0.00',
    overtimePremium: '65.17',
    grossPay: '2151.52',
  },
};

const stamp = { createdAt: '2026-01-05T15:00:00.000Z', updatedAt: '2026-01-05T15:00:00.000Z' };
export const elmsteadStaff: StaffMember[] = lines.map((l) => ({
  id: l.staffId,
  displayName: l.staffName,
  email: null,
  levelId: '1e7e1000-0000-4000-8000-000000000001',
  levelName: 'Lead',
  homeBranchId: elmstead.id,
  homeBranchName: elmstead.name,
  userId: null,
  active: true,
  ...stamp,
}));

export const entries: TimesheetEntry[] = [
  { id: 'e0000000-0000-4000-8000-000000000001', staffId: lines[0]!.staffId, staffName: 'Wren Halloway', branchId: elmstead.id, date: '2026-03-02', hours: '9.5', updatedAt: stamp.updatedAt },
  { id: 'e0000000-0000-4000-8000-000000000002', staffId: lines[1]!.staffId, staffName: 'Tamsin Greaves', branchId: elmstead.id, date: '2026-03-02', hours: '6.25', updatedAt: stamp.updatedAt },
];
