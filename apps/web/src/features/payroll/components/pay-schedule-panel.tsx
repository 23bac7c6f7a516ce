import { Button, Callout, FormGroup, H2, HTMLSelect, InputGroup, Intent, Tag } from '@blueprintjs/core';
import { LockIcon } from '@blueprintjs/icons';
import { type FormEvent, type ReactNode, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import type { PayPeriods, PaySchedule } from '../api/pay-plan-queries';
import { type PayScheduleSettings, useSetPaySchedule } from '../api/use-set-pay-schedule';

type Frequency = PaySchedule['frequency'];

const frequencyNames: Record<Frequency, string> = {
  weekly: 'Every week',
  biweekly: 'Every two weeks',
  'semi-monthly': 'Twice a month (1st–15th, 16th–month end)',
};

export const weekdayNames = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

type Field = 'frequency' | 'anchorDate' | 'workweekStartsOn';

type Props = {
  calendar: PayPeriods;
  canEdit: boolean;
  /** Today's date in the owner's first branch: a twice-monthly schedule is anchored on the 1st of its month. */
  today: string;
};

/** How pay periods fall. It can change only until the first period exists, because periods and plan dates rest on it. */
export function PaySchedulePanel({ calendar, canEdit, today }: Props) {
  const { schedule, periods } = calendar;
  const fixed = schedule !== null && periods.length > 0;
  return (
    <section className="tr-panel" aria-labelledby="pay-schedule-title">
      <div className="tr-schedule-head">
        <H2 id="pay-schedule-title" className="tr-panel-title">
          Pay schedule
        </H2>
        {fixed && (
          <Tag minimal icon={<LockIcon />}>
            Fixed
          </Tag>
        )}
      </div>
      {canEdit && !fixed ? (
        <ScheduleForm schedule={schedule} today={today} />
      ) : schedule ? (
        <>
          <ScheduleFacts schedule={schedule} />
          <p className="tr-muted tr-panel-note">
            {fixed
              ? 'Fixed now that pay periods exist: their dates and every plan’s start date rest on it.'
              : 'It can change until the first pay period is created.'}
          </p>
        </>
      ) : (
        <p className="tr-muted">The owner has not set the pay schedule yet; plans and pay periods wait for it.</p>
      )}
    </section>
  );
}

function ScheduleFacts({ schedule }: { schedule: PaySchedule }) {
  return (
    <dl className="tr-schedule-facts">
      <div>
        <dt>Paid</dt>
        <dd>{frequencyNames[schedule.frequency]}</dd>
      </div>
      {schedule.frequency !== 'semi-monthly' && (
        <div>
          <dt>Periods start on</dt>
          <dd>{businessDateText(schedule.anchorDate)} and every {schedule.frequency === 'weekly' ? 'week' : 'two weeks'} from it</dd>
        </div>
      )}
      <div>
        <dt>Workweeks start on</dt>
        <dd>{weekdayNames[schedule.workweekStartsOn]}</dd>
      </div>
    </dl>
  );
}

function ScheduleForm({ schedule, today }: { schedule: PaySchedule | null; today: string }) {
  const save = useSetPaySchedule();
  const [frequency, setFrequency] = useState<Frequency>(schedule?.frequency ?? 'biweekly');
  const [anchorDate, setAnchorDate] = useState(schedule?.anchorDate ?? '');
  const [startsOn, setStartsOn] = useState(String(schedule?.workweekStartsOn ?? 0));
  const [problems, setProblems] = useState<Partial<Record<Field, string>>>({});
  const [refusal, setRefusal] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const semiMonthly = frequency === 'semi-monthly';
    if (!semiMonthly && anchorDate === '') {
      setProblems({ anchorDate: 'Give the first day of any one pay period.' });
      return;
    }
    const body: PayScheduleSettings = { frequency, anchorDate: semiMonthly ? `${today.slice(0, 8)}01` : anchorDate, workweekStartsOn: Number(startsOn) };
    save.mutate(body, {
      onSuccess: () => {
        setProblems({});
        setRefusal(null);
        void showToast({ intent: Intent.SUCCESS, message: 'Pay schedule saved.' });
      },
      onError: (error) => {
        const found: Partial<Record<Field, string>> = {};
        if (error instanceof ApiError) for (const { field, message } of error.details) if (field in fieldIds) found[field as Field] = message;
        setProblems(found);
        setRefusal(Object.keys(found).length > 0 ? null : errorMessage(error));
      },
    });
  };

  const group = (field: Field, label: string, hint: string, control: ReactNode) => (
    <FormGroup label={label} labelFor={fieldIds[field]} intent={problems[field] ? Intent.DANGER : Intent.NONE} helperText={<span id={`${fieldIds[field]}-help`}>{problems[field] ?? hint}</span>}>
      {control}
    </FormGroup>
  );
  const a11y = (field: Field) => ({ id: fieldIds[field], 'aria-describedby': `${fieldIds[field]}-help`, 'aria-invalid': problems[field] ? (true as const) : undefined });

  return (
    <form onSubmit={submit} noValidate>
      <div className="tr-schedule-form">
        {group(
          'frequency',
          'Paid',
          'How often pay periods fall.',
          <HTMLSelect {...a11y('frequency')} fill value={frequency} onChange={(event) => setFrequency(event.currentTarget.value as Frequency)}>
            {(Object.keys(frequencyNames) as Frequency[]).map((f) => (
              <option key={f} value={f}>
                {frequencyNames[f]}
              </option>
            ))}
          </HTMLSelect>,
        )}
        {frequency !== 'semi-monthly'
          ? group(
              'anchorDate',
              'A period starts on',
              'The first day of any one pay period; the others follow from it.',
              <InputGroup {...a11y('anchorDate')} type="date" value={anchorDate} onValueChange={setAnchorDate} />,
            )
          : (
              <FormGroup label="Periods" helperText="Always the 1st to the 15th and the 16th to the month’s last day.">
                <p className="tr-schedule-fixed-days">1st–15th, 16th–end</p>
              </FormGroup>
            )}
        {group(
          'workweekStartsOn',
          'Workweeks start on',
          'Overtime is counted per workweek of seven days (29 CFR 778.104).',
          <HTMLSelect {...a11y('workweekStartsOn')} fill value={startsOn} onChange={(event) => setStartsOn(event.currentTarget.value)}>
            {weekdayNames.map((name, i) => (
              <option key={name} value={String(i)}>
                {name}
              </option>
            ))}
          </HTMLSelect>,
        )}
        <Button className="tr-schedule-save" type="submit" intent={Intent.PRIMARY} loading={save.isPending} text={schedule ? 'Save schedule' : 'Set schedule'} />
      </div>
      <p className="tr-muted tr-panel-note">
        {schedule ? 'It can still change: no pay period exists yet. ' : ''}Once the first pay period is created the schedule is fixed, because periods and plan
        start dates rest on it.
      </p>
      {refusal && (
        <Callout intent={Intent.DANGER} role="alert">
          {refusal}
        </Callout>
      )}
    </form>
  );
}

const fieldIds: Record<Field, string> = { frequency: 'schedule-frequency', anchorDate: 'schedule-anchor', workweekStartsOn: 'schedule-workweek' };
