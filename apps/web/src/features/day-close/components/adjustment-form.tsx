import { Button, Callout, FormGroup, H2, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { PlusIcon } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { type FormEvent, type ReactNode, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import { dayCloseQueries } from '../api/day-close-queries';
import { type NewAdjustment, useAddAdjustment } from '../api/use-add-adjustment';
import { adjustmentCategories } from './adjustment-categories';

type Props = { branch: { id: string; name: string }; today: string; todayClosed: boolean };

const fields = ['category', 'amount', 'staffId', 'ticketId', 'reason'] as const;
type Field = (typeof fields)[number];

/** A correction to a day already closed, booked on today's date at the branch (the closed day stays as recorded). */
export function AdjustmentForm(props: Props) {
  if (props.todayClosed) {
    return (
      <section className="tr-panel" aria-labelledby="day-adjust">
        <H2 id="day-adjust" className="tr-panel-title">
          Correct an earlier closed day
        </H2>
        <p className="tr-muted">Today is closed at {props.branch.name}, so corrections are booked from tomorrow.</p>
      </section>
    );
  }
  return <AdjustmentFields {...props} />;
}

function AdjustmentFields({ branch, today }: Props) {
  const add = useAddAdjustment();
  const staff = useQuery(dayCloseQueries.staff(branch.id));
  const [category, setCategory] = useState<NewAdjustment['category']>('service');
  const [amount, setAmount] = useState('');
  const [staffId, setStaffId] = useState('');
  const [ticketDate, setTicketDate] = useState('');
  const [ticketId, setTicketId] = useState('');
  const [reason, setReason] = useState('');
  const [problems, setProblems] = useState<Partial<Record<Field, string>>>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const tickets = useQuery({ ...dayCloseQueries.tickets(branch.id, ticketDate), enabled: ticketDate !== '' });
  const perPerson = category !== 'cash';

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const local: Partial<Record<Field, string>> = {};
    if (amount.trim() === '') local.amount = 'Give the amount: negative takes away, positive adds.';
    if (reason.trim().length < 3) local.reason = 'Say what this corrects.';
    if (Object.keys(local).length > 0) return setProblems(local);
    setRefusal(null);
    add.mutate(
      {
        branchId: branch.id,
        category,
        amount: amount.trim(),
        reason: reason.trim(),
        staffId: perPerson && staffId ? staffId : undefined,
        ticketId: ticketId || undefined,
      },
      {
        onSuccess: (adjustment) => {
          void showToast({ intent: Intent.SUCCESS, message: `${adjustmentCategories[category]} adjustment of ${adjustment.amount} booked on ${businessDateText(today)}.` });
          setAmount('');
          setReason('');
          setTicketId('');
          setProblems({});
        },
        onError: (error) => {
          const onFields: Partial<Record<Field, string>> = {};
          if (error instanceof ApiError) for (const d of error.details) if ((fields as readonly string[]).includes(d.field)) onFields[d.field as Field] = d.message;
          setProblems(onFields);
          if (Object.keys(onFields).length === 0) setRefusal(errorMessage(error));
        },
      },
    );
  };

  const group = (field: Field, label: string, control: ReactNode, hint?: string) => (
    <FormGroup label={label} labelFor={`adjust-${field}`} helperText={problems[field] ?? hint} intent={problems[field] ? Intent.DANGER : Intent.NONE}>
      {control}
    </FormGroup>
  );

  return (
    <section className="tr-panel" aria-labelledby="day-adjust">
      <H2 id="day-adjust" className="tr-panel-title">
        Correct an earlier closed day
      </H2>
      <p className="tr-muted tr-adjust-intro">
        A closed day stays as it was recorded. A correction is booked at {branch.name} on today’s date, {businessDateText(today)}.
      </p>
      <form onSubmit={submit} noValidate className="tr-adjust-form">
        {group(
          'category',
          'What it corrects',
          <HTMLSelect id="adjust-category" fill value={category} onChange={(event) => setCategory(event.currentTarget.value as NewAdjustment['category'])}>
            {Object.entries(adjustmentCategories).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </HTMLSelect>,
        )}
        {group(
          'amount',
          'Amount',
          <InputGroup id="adjust-amount" inputMode="decimal" className="tr-figure-input" value={amount} onValueChange={setAmount} />,
          'Negative takes away, e.g. -12.50.',
        )}
        {perPerson &&
          group(
            'staffId',
            'For whom',
            <HTMLSelect id="adjust-staffId" fill value={staffId} onChange={(event) => setStaffId(event.currentTarget.value)}>
              <option value="">Nobody in particular</option>
              {(staff.data ?? []).map((member) => (
                <option key={member.id} value={member.id}>
                  {member.displayName}
                </option>
              ))}
            </HTMLSelect>,
          )}
        {group(
          'ticketId',
          'Ticket it corrects',
          <div className="tr-adjust-ticket">
            <InputGroup
              type="date"
              aria-label="Day of the ticket"
              max={today}
              value={ticketDate}
              onValueChange={(value) => {
                setTicketDate(value);
                setTicketId('');
              }}
            />
            <HTMLSelect id="adjust-ticketId" value={ticketId} disabled={!ticketDate || !tickets.data} onChange={(event) => setTicketId(event.currentTarget.value)}>
              <option value="">{ticketDate ? 'No ticket in particular' : 'Choose the day first'}</option>
              {(tickets.data ?? []).map((t) => (
                <option key={t.id} value={t.id}>
                  {`Ticket ${t.number} · ${t.clientName ?? 'Walk-in'} · ${t.total}`}
                </option>
              ))}
            </HTMLSelect>
          </div>,
          'Optional.',
        )}
        {group('reason', 'Reason', <InputGroup id="adjust-reason" value={reason} onValueChange={setReason} />)}
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert">
            {refusal}
          </Callout>
        )}
        <div>
          <Button type="submit" icon={<PlusIcon />} text="Book the adjustment" loading={add.isPending} />
        </div>
      </form>
    </section>
  );
}
