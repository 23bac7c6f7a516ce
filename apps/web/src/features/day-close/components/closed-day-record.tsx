import { Callout, H2, HTMLTable, Intent } from '@blueprintjs/core';
import { LockIcon } from '@blueprintjs/icons';
import { parseDecimal } from '@tressury/domain';
import { branchTimeText } from '../../../lib/business-date';
import type { DayClose } from '../api/day-close-queries';
import { denominationValue, varianceText } from './reconciliation';

/** A closed day's record, read only. */
export function ClosedDayRecord({ close, timeZone }: { close: DayClose; timeZone: string }) {
  const counted = Object.entries(close.cashDenominations ?? {})
    .filter(([, count]) => count > 0)
    .sort(([a], [b]) => parseDecimal(b, 'face').cmp(parseDecimal(a, 'face')));
  return (
    <section className="tr-panel tr-reconcile" aria-labelledby="day-closed">
      <Callout intent={Intent.SUCCESS} icon={<LockIcon />} className="tr-closed-callout">
        Closed at {branchTimeText(close.closedAt, timeZone)}. The day’s tickets are locked; corrections go in as adjustments on a later open day.
      </Callout>
      <H2 id="day-closed" className="tr-panel-title">
        The close as recorded
      </H2>
      <dl className="tr-figures tr-reconcile-figures" aria-label="Recorded close">
        <dt>Expected in the drawer</dt>
        <dd>{close.expectedCash}</dd>
        <dt>Counted</dt>
        <dd>{close.countedCash}</dd>
        <dt className="tr-total">Cash variance</dt>
        <dd className="tr-total">{varianceText(close.cashVariance, 'short', 'over')}</dd>
        <dt>Card, by the tickets</dt>
        <dd>{close.cardTotalTickets}</dd>
        <dt>Card, by the processor</dt>
        <dd>{close.cardTotalProcessor}</dd>
        <dt className="tr-total">Card variance</dt>
        <dd className="tr-total">{varianceText(close.cardVariance, 'short', 'over')}</dd>
      </dl>
      {counted.length > 0 && (
        <HTMLTable compact className="tr-table tr-denominations" aria-label="Cash by denomination">
          <thead>
            <tr>
              <th scope="col" className="tr-figure">
                Face value
              </th>
              <th scope="col" className="tr-figure">
                How many
              </th>
              <th scope="col" className="tr-figure">
                Value
              </th>
            </tr>
          </thead>
          <tbody>
            {counted.map(([face, count]) => (
              <tr key={face}>
                <th scope="row" className="tr-figure">
                  {face}
                </th>
                <td className="tr-figure">{count}</td>
                <td className="tr-figure">{denominationValue(face, String(count))}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      <p className="tr-closed-note">
        <strong>Note:</strong> {close.note || <span className="tr-muted">none</span>}
      </p>
    </section>
  );
}
