import type { PayPeriodRow, PayrollLineRow, PayrollRunRow, PayrollRunStatus } from '@tressury/schema';
import type { PayInput, PayResult } from '@tressury/domain';
import { ApiProperty } from '@nestjs/swagger';
import Big from 'big.js';

export class PayrollRunView {
  id: string;
  periodId: string;
  startDate: string;
  endDate: string;
  /** computing → draft (or failed) → approved → exported. */
  status: PayrollRunStatus;
  /** Staff members to compute, and how many are done: poll until status is no longer computing. */
  totalStaff: number;
  processedStaff: number;
  /** Why the run failed, when it did. */
  error: string | null;
  /** Computing, but the instance working on it has not renewed its heartbeat for a minute: starting the period again replaces it. */
  stalled: boolean;
  startedAt: string;
  completedAt: string | null;
  approvedAt: string | null;
  exportedAt: string | null;
}

/** How long a computing run may go without a heartbeat before it counts as stalled; the computing instance renews it far more often. */
export const STALLED_AFTER_MS = 60_000;

export const isStalled = (run: PayrollRunRow, now: Date = new Date()): boolean =>
  run.status === 'computing' && now.getTime() - (run.heartbeatAt ?? run.startedAt).getTime() > STALLED_AFTER_MS;

export const toPayrollRunView = (run: PayrollRunRow, period: PayPeriodRow): PayrollRunView => ({
  id: run.id,
  periodId: run.periodId,
  startDate: period.startDate,
  endDate: period.endDate,
  status: run.status,
  totalStaff: run.totalStaff,
  processedStaff: run.processedStaff,
  error: run.error,
  stalled: isStalled(run),
  startedAt: run.startedAt.toISOString(),
  completedAt: run.completedAt?.toISOString() ?? null,
  approvedAt: run.approvedAt?.toISOString() ?? null,
  exportedAt: run.exportedAt?.toISOString() ?? null,
});

/** One staff member's figures in a run; money as decimal strings. */
export class PayrollLineView {
  id: string;
  runId: string;
  staffId: string;
  staffName: string;
  branchId: string;
  branchName: string;
  hours: string;
  serviceRevenue: string;
  productCharge: string;
  commissionableRevenue: string;
  serviceCommission: string;
  retailCommission: string;
  hourlyPay: string;
  tips: string;
  minimumWageTopUp: string;
  overtimePremium: string;
  grossPay: string;
}

/** A line with everything it was computed from and every figure of the computation. */
export class PayrollLineDetailView extends PayrollLineView {
  /** The computePay input as stored when the run was computed. */
  @ApiProperty({ type: 'object', additionalProperties: true })
  input: PayInput;
  /** The computePay result, with the tier breakdown and workweeks. */
  @ApiProperty({ type: 'object', additionalProperties: true })
  result: PayResult;
}

export const toPayrollLineView = (row: Omit<PayrollLineRow, 'input' | 'result'>): PayrollLineView => ({
  id: row.id,
  runId: row.runId,
  staffId: row.staffId,
  staffName: row.staffName,
  branchId: row.branchId,
  branchName: row.branchName,
  hours: new Big(row.hours).toFixed(),
  serviceRevenue: row.serviceRevenue,
  productCharge: row.productCharge,
  commissionableRevenue: row.commissionableRevenue,
  serviceCommission: row.serviceCommission,
  retailCommission: row.retailCommission,
  hourlyPay: row.hourlyPay,
  tips: row.tips,
  minimumWageTopUp: row.minimumWageTopUp,
  overtimePremium: row.overtimePremium,
  grossPay: row.grossPay,
});

export const toPayrollLineDetailView = (row: PayrollLineRow): PayrollLineDetailView => ({
  ...toPayrollLineView(row),
  input: row.input as PayInput,
  result: row.result as PayResult,
});
