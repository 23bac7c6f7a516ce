import { Button, Callout, HTMLSelect, Intent } from '@blueprintjs/core';
import { AddIcon } from '@blueprintjs/icons';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { PayPeriod, PayPeriods } from '../api/payroll-run-queries';
import { useCreatePayPeriod } from '../api/use-create-pay-period';
import { periodText } from './run-dates';
import { missingCurrentPeriod, periodStatusText } from './run-periods';

type Props = { periods: PayPeriods; chosen: PayPeriod; onChoose: (periodId: string) => void; withStatus?: boolean };

/** The stored pay periods, latest first, each with how far its payroll has come. */
export function RunPeriodChooser({ periods, chosen, onChoose, withStatus = true }: Props) {
  return (
    <HTMLSelect aria-label="Pay period" value={chosen.id} onChange={(event) => onChoose(event.currentTarget.value)}>
      {periods.periods.map((period) => (
        <option key={period.id} value={period.id}>
          {periodText(period.startDate, period.endDate)}
          {withStatus ? ` · ${periodStatusText(period)}` : ''}
        </option>
      ))}
    </HTMLSelect>
  );
}

/** Offers to create the pay period holding today when nobody has yet (owner, accountant). */
export function RunMissingPeriod({ periods, mayCreate, onCreated }: { periods: PayPeriods; mayCreate: boolean; onCreated: (periodId: string) => void }) {
  const create = useCreatePayPeriod();
  const missing = missingCurrentPeriod(periods);
  if (!missing) return null;
  return (
    <Callout intent={Intent.PRIMARY} className="tr-run-missing" title="Today’s pay period is not set up yet">
      <p>
        {periodText(missing.startDate, missing.endDate)} holds today.{' '}
        {mayCreate ? 'Set it up to enter hours and run its payroll once its days are closed.' : 'The owner or the accountant sets it up.'}
      </p>
      {mayCreate && (
        <Button
          icon={<AddIcon />}
          text={`Set up ${periodText(missing.startDate, missing.endDate)}`}
          loading={create.isPending}
          onClick={() =>
            create.mutate(missing.startDate, {
              onSuccess: (period) => onCreated(period.id),
              onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
            })
          }
        />
      )}
    </Callout>
  );
}
