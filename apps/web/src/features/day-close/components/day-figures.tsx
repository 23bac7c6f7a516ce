import { H2, H3, HTMLTable } from '@blueprintjs/core';
import { sumMoney } from '@tressury/domain';
import type { DayPreview } from '../api/day-close-queries';
import { categoryName } from './adjustment-categories';


/** The day's figures as the tickets and the card processor have them. */
export function DayFigures({ preview }: { preview: DayPreview }) {
  const tips = sumMoney(preview.tipsByStaff.map((t) => t.amount));
  return (
    <section className="tr-panel tr-day-figures" aria-labelledby="day-figures">
      <H2 id="day-figures" className="tr-panel-title">
        The day’s figures
      </H2>
      <p className="tr-muted tr-figures-counts">
        {preview.ticketsByStatus.closed} closed · {preview.ticketsByStatus.open} open · {preview.ticketsByStatus.void} void
      </p>

      <H3 className="tr-figures-heading">Revenue</H3>
      <HTMLTable compact className="tr-table" aria-label="Revenue by category">
        <tbody>
          {preview.revenueByCategory.map((row) => (
            <tr key={row.category}>
              <td>{row.category}</td>
              <td className="tr-figure">{row.amount}</td>
            </tr>
          ))}
          <tr className="tr-sum-row">
            <th scope="row">Services</th>
            <td className="tr-figure">{preview.serviceRevenue}</td>
          </tr>
          <tr>
            <th scope="row">Retail</th>
            <td className="tr-figure">{preview.retailRevenue}</td>
          </tr>
          <tr>
            <th scope="row">Retail tax</th>
            <td className="tr-figure">{preview.retailTax}</td>
          </tr>
          <tr>
            <th scope="row">Colour product used (cost)</th>
            <td className="tr-figure">{preview.colourProductCost}</td>
          </tr>
        </tbody>
      </HTMLTable>

      <H3 className="tr-figures-heading">Tips</H3>
      {preview.tipsByStaff.length === 0 ? (
        <p className="tr-muted">No tips.</p>
      ) : (
        <HTMLTable compact className="tr-table" aria-label="Tips by staff">
          <tbody>
            {preview.tipsByStaff.map((row) => (
              <tr key={row.staffId}>
                <td>{row.staffName}</td>
                <td className="tr-figure">{row.amount}</td>
              </tr>
            ))}
            <tr className="tr-sum-row">
              <th scope="row">All tips</th>
              <td className="tr-figure">{tips}</td>
            </tr>
          </tbody>
        </HTMLTable>
      )}

      {preview.adjustments.length > 0 && (
        <>
          <H3 className="tr-figures-heading">Adjustments booked this day</H3>
          <HTMLTable compact className="tr-table" aria-label="Adjustments">
            <tbody>
              {preview.adjustments.map((row) => (
                <tr key={row.id}>
                  <td>{categoryName(row.category)}</td>
                  <td>{row.reason}</td>
                  <td className="tr-figure">{row.amount}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </>
      )}
    </section>
  );
}
