import { Classes, Drawer, NonIdealState, Spinner } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { errorMessage } from '../../../lib/api-error';
import { type PayrollLine, payrollRunQueries } from '../api/payroll-run-queries';
import { periodText } from './run-dates';
import { LineDetailSections } from './line-detail-sections';

type Props = { line: PayrollLine | null; period: { startDate: string; endDate: string }; onClose: () => void };

/** Everything behind one staff member's figures: the lines they were computed from, the tiers and the workweeks. */
export function LineDetailDrawer({ line, period, onClose }: Props) {
  return (
    <Drawer
      isOpen={line !== null}
      onClose={onClose}
      size="min(860px, 96vw)"
      title={line ? `${line.staffName} · ${line.branchName}` : ''}
      className="tr-line-detail"
    >
      {line && (
        // Blueprint's drawer carries no dialog role of its own: the figures are a named region in it.
        <section className={Classes.DRAWER_BODY} aria-label={`Figures for ${line.staffName}`}>
          <div className="tr-line-detail-sections">
            <p className="tr-muted tr-line-detail-period">Pay period {periodText(period.startDate, period.endDate)}</p>
            <LineDetailBody line={line} />
          </div>
        </section>
      )}
    </Drawer>
  );
}

function LineDetailBody({ line }: { line: PayrollLine }) {
  const detail = useQuery(payrollRunQueries.line(line.runId, line.id));
  if (detail.isPending) return <Spinner aria-label="Loading the figures" />;
  if (detail.isError) return <NonIdealState icon={<ErrorIcon />} title="The figures could not be loaded" description={errorMessage(detail.error)} />;
  return <LineDetailSections detail={detail.data} />;
}
