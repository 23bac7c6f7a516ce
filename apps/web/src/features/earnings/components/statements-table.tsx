import { Button, H2, HTMLTable, Intent, NonIdealState } from '@blueprintjs/core';
import { DocumentIcon, DownloadIcon } from '@blueprintjs/icons';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { EarningsStatement } from '../api/earnings-queries';
import { useDownloadStatement } from '../api/use-download-statement';
import { moneyText, periodText } from './earnings-format';

const statusText: Record<EarningsStatement['status'], string> = {
  computing: 'Being worked out',
  draft: 'Draft',
  failed: 'Not finished',
  approved: 'Approved',
  exported: 'Approved, exported to the payroll workbook',
};

/** The caller's statements of approved pay periods, newest first, each downloadable as a workbook. */
export function StatementsTable({ statements, currency }: { statements: EarningsStatement[]; currency: string }) {
  const download = useDownloadStatement();
  const save = (statement: EarningsStatement) =>
    download.mutate(statement, {
      onSuccess: (fileName) => void showToast({ intent: Intent.SUCCESS, icon: <DownloadIcon />, message: `Saved ${fileName}.` }),
      onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
    });
  return (
    <section className="tr-panel" aria-labelledby="earnings-statements">
      <H2 id="earnings-statements" className="tr-panel-title">
        Past statements
      </H2>
      {statements.length === 0 ? (
        <NonIdealState icon={<DocumentIcon />} title="No statements yet" description="A statement appears here once a pay period’s payroll is approved." />
      ) : (
        <div className="tr-table-frame">
          <HTMLTable compact className="tr-table" aria-label="Past statements">
            <thead>
              <tr>
                <th scope="col">Pay period</th>
                <th scope="col">Status</th>
                <th scope="col" className="tr-figure">
                  Gross pay
                </th>
                <th scope="col">
                  <span className="tr-visually-hidden">Download</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {statements.map((statement) => {
                const period = periodText(statement.startDate, statement.endDate);
                return (
                  <tr key={statement.lineId}>
                    <th scope="row" className="tr-row-head">
                      {period}
                    </th>
                    <td>{statusText[statement.status]}</td>
                    <td className="tr-figure">{moneyText(statement.grossPay, currency)}</td>
                    <td className="tr-row-actions">
                      <Button
                        variant="minimal"
                        icon={<DownloadIcon />}
                        text="Statement (.xlsx)"
                        aria-label={`Download the statement for ${period} (.xlsx)`}
                        loading={download.isPending && download.variables?.lineId === statement.lineId}
                        onClick={() => save(statement)}
                      />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
        </div>
      )}
    </section>
  );
}
