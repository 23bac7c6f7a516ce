import { Button, H3, HTMLTable } from '@blueprintjs/core';
import { DownloadIcon } from '@blueprintjs/icons';
import type { FeeRow } from '../api/compare-queries';
import { type Glossary, labelOf, NO_FIGURE } from './figure-columns';
import { groupedText, monthText, rateText } from './figure-format';

type Props = {
  row: FeeRow;
  month: string;
  /** The API's headings and definitions of the fee figures. */
  glossary: Glossary;
  onDownload?: () => void;
  downloading?: boolean;
};

/** One branch's franchise fees for a month: the base, each rate and what it comes to, and the total. */
export function FeeStatement({ row, month, glossary, onDownload, downloading }: Props) {
  const title = `Fees of ${row.branchName}, ${monthText(month)}`;
  // The totals add up branches with rates of their own: there is no one rate to show.
  const rate = (fraction: string | null) =>
    fraction === null ? <span title="Each branch pays at its own rate.">{NO_FIGURE}</span> : rateText(fraction);
  const line = (figure: string, fallback: string) => (
    <th scope="row" title={glossary.get(figure)?.definition}>
      {labelOf(figure, fallback, glossary)}
    </th>
  );
  return (
    <article className="tr-panel tr-fee-statement" aria-label={title}>
      <header className="tr-fee-header">
        <H3 className="tr-panel-title">{row.branchName}</H3>
        {onDownload && (
          <Button size="small" icon={<DownloadIcon />} text="XLSX" aria-label={`Download the ${row.branchName} statement (XLSX)`} loading={downloading} onClick={onDownload} />
        )}
      </header>
      <HTMLTable compact className="tr-table" aria-label={title}>
        <thead>
          <tr>
            <th scope="col">Figure</th>
            <th scope="col" className="tr-figure">
              Rate
            </th>
            <th scope="col" className="tr-figure">
              Amount
            </th>
          </tr>
        </thead>
        <tbody>
          <tr>
            {line('grossSales', 'Gross sales')}
            <td className="tr-figure tr-muted">base</td>
            <td className="tr-figure">{groupedText(row.grossSales)}</td>
          </tr>
          <tr>
            {line('royaltyAmount', 'Royalty')}
            <td className="tr-figure">{rate(row.royaltyRate)}</td>
            <td className="tr-figure">{groupedText(row.royaltyAmount)}</td>
          </tr>
          <tr>
            {line('marketingFundAmount', 'Marketing fund')}
            <td className="tr-figure">{rate(row.marketingFundRate)}</td>
            <td className="tr-figure">{groupedText(row.marketingFundAmount)}</td>
          </tr>
          <tr className="tr-fee-total">
            {line('totalFees', 'Total fees')}
            <td className="tr-figure" />
            <td className="tr-figure">{groupedText(row.totalFees)}</td>
          </tr>
        </tbody>
      </HTMLTable>
    </article>
  );
}
