import type { PayPeriod, PayPeriods } from '../api/payroll-run-queries';

/** The period asked for with `?period=`, else the stored one holding today, else the latest stored one. */
export function choosePeriod(periods: PayPeriods, asked: string | null): PayPeriod | null {
  return (
    periods.periods.find((p) => p.id === asked) ??
    periods.periods.find((p) => periods.current !== null && p.startDate === periods.current.startDate) ??
    periods.periods[0] ??
    null
  );
}

/** The period holding today when it has not been created yet (the list holds stored periods only). */
export function missingCurrentPeriod(periods: PayPeriods): { startDate: string; endDate: string } | null {
  const current = periods.current;
  if (!current || periods.periods.some((p) => p.startDate === current.startDate)) return null;
  return current;
}

const statusWords: Record<NonNullable<PayPeriod['runStatus']>, string> = {
  computing: 'computing',
  failed: 'run failed',
  draft: 'draft',
  approved: 'approved',
  exported: 'approved, exported',
};

export const periodStatusText = (period: PayPeriod): string => (period.runStatus ? statusWords[period.runStatus] : 'not run');
