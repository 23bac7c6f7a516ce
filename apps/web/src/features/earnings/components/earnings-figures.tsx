import { H2, HTMLTable } from '@blueprintjs/core';
import type { MyEarnings } from '../api/earnings-queries';
import { isPositive, moneyText, rateText } from './earnings-format';

type Figures = NonNullable<MyEarnings['figures']>;

function Card({ label, value, note }: { label: string; value: string; note: string }) {
  return (
    <div className="tr-earnings-card">
      <dt>{label}</dt>
      <dd className="tr-figure tr-earnings-card-value">{value}</dd>
      <dd className="tr-muted tr-earnings-card-note">{note}</dd>
    </div>
  );
}

/** The period so far: what a stylist looks for first, then how the commission is reached from the revenue. */
export function EarningsFigures({ figures, currency, retailRate }: { figures: Figures; currency: string; retailRate: string }) {
  const money = (value: string) => moneyText(value, currency);
  return (
    <section className="tr-panel" aria-labelledby="earnings-so-far">
      <H2 id="earnings-so-far" className="tr-panel-title">
        This period so far
      </H2>
      <dl className="tr-earnings-cards">
        <Card label="Service commission" value={money(figures.serviceCommission)} note="on your services after the product charge" />
        <Card label="Retail commission" value={money(figures.retailCommission)} note={`${rateText(retailRate)} of your retail sales`} />
        <Card label="Tips" value={money(figures.tips)} note="yours in full, not commissioned" />
        <Card label="Hours recorded" value={figures.hours} note="from the timesheet" />
      </dl>
      <HTMLTable compact className="tr-table tr-earnings-breakdown" aria-label="How the figures add up">
        <tbody>
          <tr>
            <th scope="row">Service revenue</th>
            <td className="tr-figure">{money(figures.serviceRevenue)}</td>
          </tr>
          <tr>
            <th scope="row">Less product charge (colour used on your services)</th>
            <td className="tr-figure">{money(figures.productCharge)}</td>
          </tr>
          <tr className="tr-earnings-subtotal">
            <th scope="row">Commissionable revenue</th>
            <td className="tr-figure">{money(figures.commissionableRevenue)}</td>
          </tr>
          <tr>
            <th scope="row">Service commission (by tier, below)</th>
            <td className="tr-figure">{money(figures.serviceCommission)}</td>
          </tr>
          <tr>
            <th scope="row">Retail sales</th>
            <td className="tr-figure">{money(figures.retailRevenue)}</td>
          </tr>
          <tr>
            <th scope="row">Retail commission at {rateText(retailRate)}</th>
            <td className="tr-figure">{money(figures.retailCommission)}</td>
          </tr>
          <tr>
            <th scope="row">Tips</th>
            <td className="tr-figure">{money(figures.tips)}</td>
          </tr>
          {isPositive(figures.hourlyPay) && (
            <tr>
              <th scope="row">Hourly pay</th>
              <td className="tr-figure">{money(figures.hourlyPay)}</td>
            </tr>
          )}
        </tbody>
      </HTMLTable>
    </section>
  );
}
