import { H3, HTMLTable, Tag } from '@blueprintjs/core';
import { type PayInput, type PayResult, sumMoney } from '@tressury/domain';
import type { ReactNode } from 'react';
import type { PayrollLineDetail } from '../api/payroll-run-queries';
import { flagsOf, moneyColumns, percentText, sumHours } from './review-figures';
import { ReviewFlags } from './review-flags';
import { RunPayNote } from './run-pay-note';
import { dayText, weekdayNames } from './run-dates';

const tierModeText: Record<PayInput['plan']['tierMode'], string> = {
  marginal: 'Marginal: each band of commissionable revenue earns its own rate.',
  'whole-period': 'Whole period: all commissionable revenue earns the rate of the highest tier reached.',
};

function productChargeText({ mode, value, markup }: PayInput['plan']['productCharge']): string {
  switch (mode) {
    case 'none':
      return 'No product charge.';
    case 'actual-cost':
      return markup && markup !== '0' ? `The colour product's cost plus ${percentText(markup)}.` : 'The colour product’s cost.';
    case 'percent-of-price':
      return `${percentText(value ?? '0')} of each colour service’s price.`;
    case 'fixed-per-colour-service':
      return `${value ?? '0'} for each colour service.`;
  }
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  const id = `line-detail-${title.toLowerCase().replaceAll(/[^a-z]+/g, '-')}`;
  return (
    <section aria-labelledby={id} className="tr-line-detail-section">
      <H3 id={id} className="tr-line-detail-title">
        {title}
      </H3>
      {children}
    </section>
  );
}

const Empty = ({ children }: { children: ReactNode }) => <p className="tr-muted">{children}</p>;

/** The stored input and result of one staff member's computation, laid out to be checked by hand. */
export function LineDetailSections({ detail }: { detail: PayrollLineDetail }) {
  const { input, result } = detail;
  return (
    <>
      <RunPayNote />
      <Section title="Figures">
        <ReviewFlags flags={flagsOf(detail)} />
        <dl className="tr-line-detail-figures">
          <dt>Hours</dt>
          <dd className="tr-figure">{detail.hours}</dd>
          {moneyColumns.map(({ key, label }) => (
            <FigureRow key={key} label={label} value={detail[key]} strong={key === 'grossPay'} />
          ))}
        </dl>
      </Section>
      <Section title="Commission tiers">
        <p>{tierModeText[input.plan.tierMode]}</p>
        <TierTable result={result} />
        <p className="tr-muted">
          Product charge: {productChargeText(input.plan.productCharge)} Retail commission {percentText(input.plan.retailRate)} of retail sales.
          {input.plan.hourlyRate ? ` Hourly rate ${input.plan.hourlyRate}.` : ''}
        </p>
      </Section>
      <Section title="Workweeks">
        <WorkweekTable input={input} result={result} />
      </Section>
      <Section title={`Service lines (${input.serviceLines.length})`}>
        <ServiceLineTable lines={input.serviceLines} />
      </Section>
      {input.productChargeAdjustments && input.productChargeAdjustments.length > 0 && (
        <Section title={`Product charge adjustments (${input.productChargeAdjustments.length})`}>
          <DatedAmounts caption="Product charge adjustments" rows={input.productChargeAdjustments.map((a) => ({ key: a.id, date: a.date, amount: a.amount }))} />
        </Section>
      )}
      <Section title={`Retail lines (${input.retailLines.length})`}>
        {input.retailLines.length === 0 ? (
          <Empty>No retail sold in this period.</Empty>
        ) : (
          <DatedAmounts caption="Retail lines" rows={input.retailLines.map((line) => ({ key: line.id, date: line.date, amount: line.amount }))} />
        )}
      </Section>
      <Section title={`Tips (${input.tips.length})`}>
        {input.tips.length === 0 ? (
          <Empty>No tips in this period.</Empty>
        ) : (
          <DatedAmounts caption="Tips" rows={input.tips.map((tip, i) => ({ key: `${tip.date}-${i}`, date: tip.date, amount: tip.amount }))} />
        )}
        <p className="tr-muted">Tips are passed through as paid and are not part of the regular rate (29 CFR 531.60).</p>
      </Section>
      <Section title="Hours by day">
        <HoursTable input={input} />
      </Section>
    </>
  );
}

function FigureRow({ label, value, strong }: { label: string; value: string; strong?: boolean }) {
  return (
    <>
      <dt className={strong ? 'tr-line-detail-strong' : undefined}>{label}</dt>
      <dd className={`tr-figure${strong ? ' tr-line-detail-strong' : ''}`}>{value}</dd>
    </>
  );
}

function TierTable({ result }: { result: PayResult }) {
  return (
    <HTMLTable compact className="tr-table" aria-label="Commission tiers">
      <thead>
        <tr>
          <th scope="col" className="tr-figure">
            From
          </th>
          <th scope="col" className="tr-figure">
            Up to
          </th>
          <th scope="col" className="tr-figure">
            Rate
          </th>
          <th scope="col" className="tr-figure">
            Revenue in band
          </th>
          <th scope="col" className="tr-figure">
            Commission
          </th>
        </tr>
      </thead>
      <tbody>
        {result.tierBreakdown.map((tier) => (
          <tr key={tier.from}>
            <td className="tr-figure">{tier.from}</td>
            <td className="tr-figure">{tier.to ?? 'and above'}</td>
            <td className="tr-figure">{percentText(tier.rate)}</td>
            <td className="tr-figure">{tier.base}</td>
            <td className="tr-figure">{tier.commission}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" colSpan={3}>
            Commissionable revenue and service commission
          </th>
          <td className="tr-figure">{result.commissionableRevenue}</td>
          <td className="tr-figure">{result.serviceCommission}</td>
        </tr>
      </tfoot>
    </HTMLTable>
  );
}

function WorkweekTable({ input, result }: { input: PayInput; result: PayResult }) {
  const rules = input.wageRules;
  return (
    <>
      <p className="tr-muted">
        Minimum wage {rules.minimumWage} an hour; overtime over {rules.overtimeAfterHours} hours at {rules.overtimeMultiplier} × the regular rate; workweeks start on{' '}
        {weekdayNames[rules.workweekStartsOn]}; the commission exemption (29 U.S.C. 207(i)) is {rules.commissionExemption ? 'on' : 'off'} at this branch, so a week marked exempt pays no overtime premium. Commission is spread over the
        workweeks by hours worked (29 CFR 778.120(b)).
      </p>
      {result.workweeks.length === 0 ? (
        <Empty>No hours recorded in this period, so there are no workweeks to check.</Empty>
      ) : (
        <HTMLTable compact className="tr-table" aria-label="Workweeks">
          <thead>
            <tr>
              <th scope="col">Week starting</th>
              <th scope="col" className="tr-figure">
                Hours
              </th>
              <th scope="col" className="tr-figure">
                Earnings
              </th>
              <th scope="col" className="tr-figure">
                Regular rate
              </th>
              <th scope="col" className="tr-figure">
                Minimum-wage top-up
              </th>
              <th scope="col" className="tr-figure">
                Overtime hours
              </th>
              <th scope="col" className="tr-figure">
                Overtime premium
              </th>
              <th scope="col">Overtime rule</th>
            </tr>
          </thead>
          <tbody>
            {result.workweeks.map((week) => (
              <tr key={week.start}>
                <th scope="row" className="tr-nowrap">
                  {dayText(week.start)}
                </th>
                <td className="tr-figure">{week.hours}</td>
                <td className="tr-figure">{week.earnings}</td>
                <td className="tr-figure">{week.regularRate}</td>
                <td className="tr-figure">{week.minimumWageTopUp}</td>
                <td className="tr-figure">{week.overtimeHours}</td>
                <td className="tr-figure">{week.overtimePremium}</td>
                <td>{week.exempt ? <Tag minimal>Exempt</Tag> : 'Applies'}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row">Period</th>
              <td className="tr-figure">{sumHours(result.workweeks.map((w) => w.hours))}</td>
              <td />
              <td />
              <td className="tr-figure">{sumMoney(result.workweeks.map((w) => w.minimumWageTopUp))}</td>
              <td className="tr-figure">{sumHours(result.workweeks.map((w) => w.overtimeHours))}</td>
              <td className="tr-figure">{sumMoney(result.workweeks.map((w) => w.overtimePremium))}</td>
              <td />
            </tr>
          </tfoot>
        </HTMLTable>
      )}
    </>
  );
}

function ServiceLineTable({ lines }: { lines: PayInput['serviceLines'] }) {
  if (lines.length === 0) return <Empty>No services in this period.</Empty>;
  const sorted = [...lines].sort((a, b) => a.date.localeCompare(b.date));
  return (
    <div className="tr-line-detail-scroll">
      <HTMLTable compact className="tr-table" aria-label="Service lines">
        <thead>
          <tr>
            <th scope="col">Day</th>
            <th scope="col">Kind</th>
            <th scope="col" className="tr-figure">
              Price
            </th>
            <th scope="col" className="tr-figure">
              Colour product cost
            </th>
            <th scope="col" className="tr-figure">
              Share credited
            </th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((line) => (
            <tr key={line.id}>
              <td className="tr-nowrap">{dayText(line.date)}</td>
              <td>{line.isColour ? 'Colour service' : 'Service'}</td>
              <td className="tr-figure">{line.price}</td>
              <td className="tr-figure">{line.isColour ? line.productCost : '—'}</td>
              <td className="tr-figure">{line.share === undefined ? '100 %' : `${percentText(line.share)}${line.id.endsWith(':assistant') ? ' (assisting)' : ''}`}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" colSpan={2}>
              Listed prices, before shares
            </th>
            <td className="tr-figure">{sumMoney(sorted.map((line) => line.price))}</td>
            <td className="tr-figure">{sumMoney(sorted.filter((line) => line.isColour).map((line) => line.productCost))}</td>
            <td />
          </tr>
        </tfoot>
      </HTMLTable>
      <p className="tr-muted">Refunds and adjustments booked in this period are lines of their own; a refund has a negative price.</p>
    </div>
  );
}

function DatedAmounts({ caption, rows }: { caption: string; rows: { key: string; date: string; amount: string }[] }) {
  const sorted = [...rows].sort((a, b) => a.date.localeCompare(b.date));
  return (
    <div className="tr-line-detail-scroll">
      <HTMLTable compact className="tr-table" aria-label={caption}>
        <thead>
          <tr>
            <th scope="col">Day</th>
            <th scope="col" className="tr-figure">
              Amount
            </th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <tr key={row.key}>
              <td className="tr-nowrap">{dayText(row.date)}</td>
              <td className="tr-figure">{row.amount}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row">Total</th>
            <td className="tr-figure">{sumMoney(sorted.map((row) => row.amount))}</td>
          </tr>
        </tfoot>
      </HTMLTable>
    </div>
  );
}

function HoursTable({ input }: { input: PayInput }) {
  if (input.hours.length === 0) return <Empty>No hours entered for this period.</Empty>;
  const sorted = [...input.hours].sort((a, b) => a.date.localeCompare(b.date));
  return (
    <HTMLTable compact className="tr-table" aria-label="Hours by day">
      <thead>
        <tr>
          <th scope="col">Day</th>
          <th scope="col" className="tr-figure">
            Hours
          </th>
        </tr>
      </thead>
      <tbody>
        {sorted.map((entry) => (
          <tr key={entry.date}>
            <td className="tr-nowrap">{dayText(entry.date)}</td>
            <td className="tr-figure">{entry.hours}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
