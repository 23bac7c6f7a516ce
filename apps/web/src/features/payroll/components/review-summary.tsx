import type { PayrollLine } from '../api/payroll-run-queries';
import { flagsOf, type MoneyKey, totalsOf } from './review-figures';

const shown: { key: MoneyKey; label: string }[] = [
  { key: 'serviceCommission', label: 'Service commission' },
  { key: 'retailCommission', label: 'Retail commission' },
  { key: 'tips', label: 'Tips' },
  { key: 'minimumWageTopUp', label: 'Minimum-wage top-ups' },
  { key: 'overtimePremium', label: 'Overtime premiums' },
  { key: 'grossPay', label: 'Gross pay' },
];

/** The run's totals at a glance, the same sums as the grid's totals row. */
export function ReviewSummary({ lines }: { lines: PayrollLine[] }) {
  const totals = totalsOf(lines);
  const flagged = lines.filter((line) => flagsOf(line).length > 0).length;
  return (
    <dl className="tr-review-summary" aria-label="Run totals">
      <div>
        <dt>Staff</dt>
        <dd className="tr-figure">{lines.length}</dd>
      </div>
      <div>
        <dt>Hours</dt>
        <dd className="tr-figure">{totals.hours}</dd>
      </div>
      {shown.map(({ key, label }) => (
        <div key={key} className={key === 'grossPay' ? 'tr-review-summary-main' : undefined}>
          <dt>{label}</dt>
          <dd className="tr-figure" aria-label={label}>
            {totals[key]}
          </dd>
        </div>
      ))}
      <div>
        <dt>Flagged lines</dt>
        <dd className="tr-figure">{flagged}</dd>
      </div>
    </dl>
  );
}
