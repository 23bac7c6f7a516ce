import { Button, Callout, H2, Intent, ProgressBar, Tag } from '@blueprintjs/core';
import { DownloadIcon, LockIcon, PlayIcon, RefreshIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { PayrollRun } from '../api/payroll-run-queries';
import { useApprovePayrollRun } from '../api/use-approve-payroll-run';
import { type PayrollFileKind, useDownloadPayrollFile } from '../api/use-download-payroll-file';
import { useStartPayrollRun } from '../api/use-start-payroll-run';
import { RunApproveDialog } from './run-approve-dialog';
import { dayText, momentText, periodText } from './run-dates';
import { RunStatements } from './run-statements';

export type RunPermissions = { run: boolean; approve: boolean; download: boolean; sendStatements: boolean };

type Props = {
  periodId: string;
  period: { startDate: string; endDate: string };
  run: PayrollRun | null;
  /** Staff on the review grid, their gross pay total and names, for the approval question and the statements. */
  reviewed: { staff: number; grossPay: string; names: Map<string, string> } | null;
  may: RunPermissions;
  timeZone: string;
  /** True while the period has days still to come: a run then holds the days closed so far. */
  periodOpen: boolean;
  onStarted: (run: PayrollRun) => void;
};

/** The period's run: start it, watch it compute, approve it, download it. */
export function RunPanel({ periodId, period, run, reviewed, may, timeZone, periodOpen, onStarted }: Props) {
  const start = useStartPayrollRun();
  const approve = useApprovePayrollRun();
  const download = useDownloadPayrollFile();
  const [confirming, setConfirming] = useState(false);
  const range = periodText(period.startDate, period.endDate);

  const startRun = () =>
    start.mutate(periodId, {
      onSuccess: onStarted,
      onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
    });
  const approveRun = (runId: string) =>
    approve.mutate(runId, {
      onSuccess: () => {
        setConfirming(false);
        void showToast({ intent: Intent.SUCCESS, icon: <LockIcon />, message: `The payroll for ${range} is approved; its figures are frozen.` });
      },
      onError: (error) => {
        setConfirming(false);
        void showToast({ intent: Intent.DANGER, message: errorMessage(error) });
      },
    });
  const fetchFile = (runId: string, kind: PayrollFileKind) =>
    download.mutate(
      { runId, kind },
      {
        onSuccess: (fileName) => void showToast({ intent: Intent.SUCCESS, icon: <DownloadIcon />, message: `Saved ${fileName}.` }),
        onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
      },
    );

  const runButton = (text: string) =>
    may.run && <Button intent={run ? Intent.NONE : Intent.PRIMARY} icon={run ? <RefreshIcon /> : <PlayIcon />} text={text} loading={start.isPending} onClick={startRun} />;

  return (
    <section aria-labelledby="run-panel-title" className="tr-panel tr-run-panel">
      <H2 id="run-panel-title" className="tr-panel-title">
        Payroll run
      </H2>
      {!run && (
        <div className="tr-run-row">
          <p>
            <Tag minimal>Not run yet</Tag> The run adds up every staff member’s services, retail, tips and hours for {range}, from closed days only: a day a branch
            has not closed yet is left out.
          </p>
          {runButton('Run payroll')}
        </div>
      )}
      {run?.status === 'computing' && !run.stalled && (
        <div className="tr-run-progress" aria-live="polite">
          <p>
            {run.totalStaff > 0 ? (
              <>
                Computing: <strong>{run.processedStaff}</strong> of <strong>{run.totalStaff}</strong> staff members done.
              </>
            ) : (
              'Computing: finding everyone with hours, services or sales on closed days…'
            )}
          </p>
          <ProgressBar
            intent={Intent.PRIMARY}
            value={run.totalStaff > 0 ? run.processedStaff / run.totalStaff : undefined}
            aria-label="Payroll run progress"
            aria-valuetext={run.totalStaff > 0 ? `${run.processedStaff} of ${run.totalStaff} staff members` : 'Starting'}
          />
        </div>
      )}
      {run?.status === 'computing' && run.stalled && (
        <Callout intent={Intent.WARNING} title="This run has stalled — start again" role="alert">
          <p>
            It stopped after {run.processedStaff} of {run.totalStaff} staff members and has not moved for over a minute. Starting again replaces it.
          </p>
          {runButton('Start again')}
        </Callout>
      )}
      {run?.status === 'failed' && (
        <Callout intent={Intent.DANGER} title="The run did not finish" role="alert">
          <p>{run.error ?? 'The server gave no reason.'}</p>
          {runButton('Start again')}
        </Callout>
      )}
      {run?.status === 'draft' && (
        <div className="tr-run-row">
          <p>
            <Tag intent={Intent.WARNING} minimal>
              Draft
            </Tag>{' '}
            Computed {run.completedAt ? momentText(run.completedAt, timeZone) : ''}.{' '}
            {may.run ? 'The figures can still change: run it again after correcting hours or tickets.' : 'The figures can still change until the payroll is approved.'}
            {periodOpen && ` The period runs until ${dayText(period.endDate)}: days not closed yet are not in these figures.`}
          </p>
          <div className="tr-run-actions">
            {runButton('Run again')}
            {may.approve && <Button intent={Intent.PRIMARY} icon={<LockIcon />} text="Approve…" onClick={() => setConfirming(true)} />}
          </div>
        </div>
      )}
      {(run?.status === 'approved' || run?.status === 'exported') && (
        <div className="tr-run-stack">
          <p>
            <Tag intent={Intent.SUCCESS} icon={<LockIcon />}>
              {run.status === 'approved' ? 'Approved' : 'Approved and exported'}
            </Tag>{' '}
            {run.approvedAt && `Approved ${momentText(run.approvedAt, timeZone)}. `}
            {run.exportedAt && `First downloaded ${momentText(run.exportedAt, timeZone)}. `}
            The figures are frozen.
          </p>
          <div className="tr-run-actions">
            {may.download && (
              <>
                <Button
                  intent={Intent.PRIMARY}
                  icon={<DownloadIcon />}
                  text="Download workbook (.xlsx)"
                  loading={download.isPending && download.variables?.kind === 'workbook'}
                  onClick={() => fetchFile(run.id, 'workbook')}
                />
                <Button
                  icon={<DownloadIcon />}
                  text="Download summary (.csv)"
                  loading={download.isPending && download.variables?.kind === 'summary'}
                  onClick={() => fetchFile(run.id, 'summary')}
                />
              </>
            )}
            {may.sendStatements && <RunStatements runId={run.id} staff={reviewed?.staff ?? run.totalStaff} names={reviewed?.names ?? new Map()} />}
          </div>
        </div>
      )}
      {run && (
        <RunApproveDialog
          isOpen={confirming}
          period={range}
          staff={reviewed?.staff ?? run.totalStaff}
          grossPay={reviewed?.grossPay ?? null}
          periodOpen={periodOpen}
          busy={approve.isPending}
          onConfirm={() => approveRun(run.id)}
          onCancel={() => setConfirming(false)}
        />
      )}
    </section>
  );
}
