import type { PayFrequency, PayPeriodRow, PayScheduleRow, PayrollRunStatus } from '@tressury/schema';

export class PayScheduleView {
  frequency: PayFrequency;
  anchorDate: string;
  /** 0 = Sunday … 6 = Saturday. */
  workweekStartsOn: number;
}

export class PeriodRangeView {
  startDate: string;
  endDate: string;
}

export class PayPeriodView {
  id: string;
  startDate: string;
  endDate: string;
  /** The period's payroll run, if one was started. */
  runId: string | null;
  runStatus: PayrollRunStatus | null;
}

export class PayPeriodsView {
  /** Null until the owner sets it. */
  schedule: PayScheduleView | null;
  /** The period holding today (UTC), stored or not. */
  current: PeriodRangeView | null;
  /** The period that POST /api/payroll/periods would create without a date. */
  next: PeriodRangeView | null;
  /** Stored periods, latest first (at most 26). */
  periods: PayPeriodView[];
}

export const toPayScheduleView = (row: PayScheduleRow): PayScheduleView => ({
  frequency: row.frequency,
  anchorDate: row.anchorDate,
  workweekStartsOn: row.workweekStartsOn,
});

export const toPayPeriodView = (row: PayPeriodRow, run: { id: string; status: PayrollRunStatus } | null): PayPeriodView => ({
  id: row.id,
  startDate: row.startDate,
  endDate: row.endDate,
  runId: run?.id ?? null,
  runStatus: run?.status ?? null,
});
