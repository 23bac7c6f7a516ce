import { H2, HTMLTable, Tag } from '@blueprintjs/core';
import type { MyEarnings } from '../api/earnings-queries';
import { moneyText, rateText } from './earnings-format';

type Figures = NonNullable<MyEarnings['figures']>;

/** Commission tier by tier: the band of revenue each tier covers, the revenue that fell in it and what it earned. */
export function TierBreakdown({ figures, currency, tierMode, currentTier }: { figures: Figures; currency: string; tierMode: string; currentTier: number | null }) {
  const money = (value: string) => moneyText(value, currency);
  return (
    <section className="tr-panel" aria-labelledby="earnings-tiers">
      <H2 id="earnings-tiers" className="tr-panel-title">
        Commission by tier
      </H2>
      <p className="tr-muted tr-earnings-explain">
        {tierMode === 'whole-period'
          ? 'Your plan pays all of the period’s commissionable revenue at the rate of the highest tier it reaches.'
          : 'Your plan pays each band of the period’s commissionable revenue at its own tier’s rate.'}
      </p>
      <div className="tr-table-frame">
        <HTMLTable compact className="tr-table" aria-label="Commission by tier">
          <thead>
            <tr>
              <th scope="col">Tier</th>
              <th scope="col" className="tr-figure">
                Revenue from
              </th>
              <th scope="col" className="tr-figure">
                Up to
              </th>
              <th scope="col" className="tr-figure">
                Rate
              </th>
              <th scope="col" className="tr-figure">
                Your revenue in it
              </th>
              <th scope="col" className="tr-figure">
                Commission
              </th>
            </tr>
          </thead>
          <tbody>
            {figures.tierBreakdown.map((row, i) => (
              <tr key={row.from}>
                <th scope="row" className="tr-row-head">
                  Tier {i + 1}{' '}
                  {i === currentTier && (
                    <Tag minimal round className="tr-earnings-here">
                      you are here
                    </Tag>
                  )}
                </th>
                <td className="tr-figure">{money(row.from)}</td>
                <td className="tr-figure">{row.to === null ? 'and above' : money(row.to)}</td>
                <td className="tr-figure">{rateText(row.rate)}</td>
                <td className="tr-figure">{money(row.base)}</td>
                <td className="tr-figure">{money(row.commission)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr className="tr-earnings-subtotal">
              <th scope="row" colSpan={4}>
                Total
              </th>
              <td className="tr-figure">{money(figures.commissionableRevenue)}</td>
              <td className="tr-figure">{money(figures.serviceCommission)}</td>
            </tr>
          </tfoot>
        </HTMLTable>
      </div>
    </section>
  );
}
