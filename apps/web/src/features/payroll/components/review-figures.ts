import { sumMoney } from '@tressury/domain';
import type { PayrollLine } from '../api/payroll-run-queries';

export type MoneyKey = Exclude<keyof PayrollLine, 'id' | 'runId' | 'staffId' | 'staffName' | 'branchId' | 'branchName' | 'hours'>;
export type FlagKind = 'top-up' | 'overtime' | 'negative-commission' | 'no-hours';

/** The grid's figure columns, in the order an accountant reads a pay line: revenue, commission, pay. */
export const moneyColumns: { key: MoneyKey; label: string }[] = [
  { key: 'serviceRevenue', label: 'Service revenue' },
  { key: 'productCharge', label: 'Product charge' },
  { key: 'commissionableRevenue', label: 'Commissionable' },
  { key: 'serviceCommission', label: 'Service commission' },
  { key: 'retailCommission', label: 'Retail commission' },
  { key: 'hourlyPay', label: 'Hourly pay' },
  { key: 'tips', label: 'Tips' },
  { key: 'minimumWageTopUp', label: 'Minimum-wage top-up' },
  { key: 'overtimePremium', label: 'Overtime premium' },
  { key: 'grossPay', label: 'Gross pay' },
];

const HOURS_DP = 3;

/** A decimal string as a whole number of 10^-dp units: exact, so figures compare and add without floats. */
export function decimalUnits(value: string, dp = HOURS_DP): bigint {
  const negative = value.startsWith('-');
  const [whole = '0', fraction = ''] = value.replace(/^[-+]/, '').split('.');
  const units = BigInt(whole + fraction.padEnd(dp, '0').slice(0, dp));
  return negative ? -units : units;
}

export const isNegative = (value: string): boolean => decimalUnits(value) < 0n;
export const isPositive = (value: string): boolean => decimalUnits(value) > 0n;

export function compareDecimal(a: string, b: string): number {
  const difference = decimalUnits(a) - decimalUnits(b);
  return difference === 0n ? 0 : difference < 0n ? -1 : 1;
}

/** Thousandths back to a plain decimal without trailing zeros: 80500n → "80.5". */
function unitsText(units: bigint, dp: number): string {
  const sign = units < 0n ? '-' : '';
  const digits = (units < 0n ? -units : units).toString().padStart(dp + 1, '0');
  const fraction = digits.slice(-dp).replace(/0+$/, '');
  return `${sign}${digits.slice(0, -dp)}${fraction ? `.${fraction}` : ''}`;
}

export const sumHours = (values: string[]): string => unitsText(values.reduce((total, value) => total + decimalUnits(value, HOURS_DP), 0n), HOURS_DP);

/** A fraction as a percentage, exactly: "0.405" → "40.5 %". */
export const percentText = (fraction: string): string => `${unitsText(decimalUnits(fraction, 6), 4)} %`;

/** Each column's total is the sum of the figures shown, each already rounded to the cent (sumMoney, big.js). */
export function totalsOf(lines: PayrollLine[]): Record<MoneyKey, string> & { hours: string } {
  const totals = { hours: sumHours(lines.map((line) => line.hours)) } as Record<MoneyKey, string> & { hours: string };
  for (const { key } of moneyColumns) totals[key] = sumMoney(lines.map((line) => line[key]));
  return totals;
}

/** What the accountant should look at twice on a line. */
export function flagsOf(line: Pick<PayrollLine, 'hours' | 'minimumWageTopUp' | 'overtimePremium' | 'serviceCommission' | 'retailCommission' | 'grossPay'>): FlagKind[] {
  const flags: FlagKind[] = [];
  // Without hours there are no workweeks: neither the minimum wage nor overtime could be checked.
  if (!isPositive(line.hours) && isPositive(line.grossPay)) flags.push('no-hours');
  if (isPositive(line.minimumWageTopUp)) flags.push('top-up');
  if (isPositive(line.overtimePremium)) flags.push('overtime');
  if (isNegative(line.serviceCommission) || isNegative(line.retailCommission)) flags.push('negative-commission');
  return flags;
}

export const flagLabels: Record<FlagKind, { label: string; meaning: string }> = {
  'top-up': { label: 'Top-up', meaning: 'Commission and hourly pay fell short of the minimum wage for the hours worked in a workweek; the difference is added.' },
  overtime: { label: 'Overtime', meaning: 'More hours than the overtime threshold in a workweek; the premium is added on the regular rate.' },
  'no-hours': { label: 'No hours', meaning: 'No hours were entered for this period, so the minimum wage and overtime could not be checked.' },
  'negative-commission': {
    label: 'Negative commission',
    meaning: 'Refunds or charges booked in this period came to more than the sales: the commission is below zero.',
  },
};
