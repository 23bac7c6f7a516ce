import { Button, FormGroup, H2, HTMLTable, InputGroup, Intent } from '@blueprintjs/core';
import { PlusIcon, TrashIcon } from '@blueprintjs/icons';
import { type FormEvent, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { StaffMember } from '../api/picker-queries';
import type { Ticket } from '../api/ticket-queries';
import { useAddTip } from '../api/use-add-tip';
import { useRemoveTip } from '../api/use-remove-tip';
import { fieldProblems, leftoverProblem, type Problems } from './field-problems';
import { StaffSelect } from './staff-select';
import type { TicketPermissions } from './ticket-permissions';

type Props = { ticket: Ticket; staff: StaffMember[]; can: TicketPermissions };

/** Tips pass through to the person untouched (DESIGN.md §1); the desk records them. */
export function TipsPanel({ ticket, staff, can }: Props) {
  const remove = useRemoveTip(ticket.id);
  if (ticket.tips.length === 0 && !can.deskWork) return null;

  return (
    <section className="tr-panel tr-ticket-panel" aria-labelledby="ticket-tips">
      <H2 id="ticket-tips" className="tr-panel-title">
        Tips
      </H2>
      {ticket.tips.length === 0 ? (
        <p className="tr-muted">No tips yet.</p>
      ) : (
        <HTMLTable compact className="tr-table" aria-label="Tips">
          <thead>
            <tr>
              <th scope="col">For</th>
              <th scope="col" className="tr-figure">
                Amount
              </th>
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {ticket.tips.map((tip) => (
              <tr key={tip.id}>
                <td className="tr-row-head">{tip.staffName}</td>
                <td className="tr-figure">{tip.amount}</td>
                <td className="tr-row-actions">
                  {can.deskWork && (
                    <Button
                      size="small"
                      variant="minimal"
                      icon={<TrashIcon />}
                      aria-label={`Remove the tip for ${tip.staffName}`}
                      loading={remove.isPending && remove.variables === tip.id}
                      onClick={() => remove.mutate(tip.id, { onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }) })}
                    />
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {can.deskWork && <AddTipForm ticketId={ticket.id} staff={staff} />}
    </section>
  );
}

function AddTipForm({ ticketId, staff }: { ticketId: string; staff: StaffMember[] }) {
  const add = useAddTip(ticketId);
  const [staffId, setStaffId] = useState('');
  const [amount, setAmount] = useState('');
  const [problems, setProblems] = useState<Problems>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const local: Problems = {};
    if (!staffId) local.staffId = 'Who is the tip for?';
    if (amount.trim() === '') local.amount = 'Give the amount.';
    if (Object.keys(local).length > 0) return setProblems(local);
    add.mutate(
      { staffId, amount: amount.trim() },
      {
        onSuccess: () => {
          setStaffId('');
          setAmount('');
          setProblems({});
        },
        onError: (error) => {
          setProblems(fieldProblems(error));
          const elsewhere = leftoverProblem(error, ['staffId', 'amount']);
          if (elsewhere) void showToast({ intent: Intent.DANGER, message: elsewhere });
        },
      },
    );
  };

  return (
    <form className="tr-add-form" onSubmit={submit} noValidate aria-label="Add a tip">
      <div className="tr-add-grid">
        <FormGroup className="tr-add-mid tr-add-capped" label="Tip for" labelFor="add-tip-staff" helperText={problems.staffId} intent={problems.staffId ? Intent.DANGER : Intent.NONE}>
          <StaffSelect id="add-tip-staff" staff={staff} value={staffId} onChange={setStaffId} emptyLabel="Choose a person" invalid={Boolean(problems.staffId)} />
        </FormGroup>
        <FormGroup className="tr-add-narrow" label="Amount" labelFor="add-tip-amount" helperText={problems.amount} intent={problems.amount ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="add-tip-amount" inputMode="decimal" className="tr-figure-input" value={amount} onValueChange={setAmount} />
        </FormGroup>
        <div className="tr-add-submit">
          <Button type="submit" icon={<PlusIcon />} text="Add tip" loading={add.isPending} />
        </div>
      </div>
    </form>
  );
}
