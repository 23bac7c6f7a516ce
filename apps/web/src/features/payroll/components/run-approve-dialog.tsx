import { Alert, Intent } from '@blueprintjs/core';
import { LockIcon } from '@blueprintjs/icons';

type Props = {
  isOpen: boolean;
  period: string;
  staff: number;
  grossPay: string | null;
  periodOpen: boolean;
  busy: boolean;
  onConfirm: () => void;
  onCancel: () => void;
};

/** Approval cannot be undone: the dialog says what it freezes before anything is sent. */
export function RunApproveDialog({ isOpen, period, staff, grossPay, periodOpen, busy, onConfirm, onCancel }: Props) {
  return (
    <Alert
      isOpen={isOpen}
      icon={<LockIcon />}
      intent={Intent.PRIMARY}
      confirmButtonText="Approve and freeze"
      cancelButtonText="Not yet"
      loading={busy}
      onConfirm={onConfirm}
      onCancel={onCancel}
      canEscapeKeyCancel
    >
      <p>
        <strong>Approve the payroll for {period}?</strong>
      </p>
      <p>
        Approving freezes the figures of all {staff} staff {grossPay !== null && <>(gross pay {grossPay}) </>}as they stand: the run can no longer be run again, and
        hours in this period can no longer change. This cannot be undone.
      </p>
      {periodOpen && (
        <p>
          <strong>The period has not ended yet:</strong> days still to come, and days not closed yet, will not be in the approved figures.
        </p>
      )}
      <p className="tr-muted">After approval the workbook and the summary can be downloaded.</p>
    </Alert>
  );
}
