import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, H2, InputGroup, Intent, Radio, RadioGroup, TextArea } from '@blueprintjs/core';
import { BanCircleIcon, UndoIcon } from '@blueprintjs/icons';
import { retailLineAmounts, sumMoney } from '@tressury/domain';
import { type FormEvent, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Ticket } from '../api/ticket-queries';
import { type NewRefund, useRefundTicket } from '../api/use-refund-ticket';
import { useVoidTicket } from '../api/use-void-ticket';
import { newCheckoutKey } from './checkout-key';
import { fieldProblems, type Problems } from './field-problems';
import { signOf } from './figures';
import type { TicketPermissions } from './ticket-permissions';

/** Void and refund: a manager's or owner's part (DESIGN.md §2). */
export function ManagerActions({ ticket, can }: { ticket: Ticket; can: TicketPermissions }) {
  const [open, setOpen] = useState<'void' | 'refund' | null>(null);
  // Only a ticket nobody has paid on: money taken (even if refunded since) stays on the record.
  const unpaid = signOf(ticket.totals.paid) === 0 && ticket.payments.every((p) => p.status === 'failed');
  const voidable = can.voids && unpaid;
  const choices = refundChoices(ticket);
  const refundable = can.refunds && choices.services.length + choices.retail.length > 0;
  if (!voidable && !refundable) return null;

  return (
    <section className="tr-panel tr-manager-actions" aria-labelledby="ticket-manager">
      <H2 id="ticket-manager" className="tr-panel-title">
        Manager
      </H2>
      <div className="tr-button-row">
        {voidable && <Button icon={<BanCircleIcon />} intent={Intent.DANGER} variant="outlined" text="Void ticket…" onClick={() => setOpen('void')} />}
        {refundable && <Button icon={<UndoIcon />} variant="outlined" text="Refund…" onClick={() => setOpen('refund')} />}
      </div>
      <Dialog isOpen={open === 'void'} onClose={() => setOpen(null)} title={`Void ticket ${ticket.number}`}>
        {open === 'void' && <VoidForm ticket={ticket} onDone={() => setOpen(null)} />}
      </Dialog>
      <Dialog isOpen={open === 'refund'} onClose={() => setOpen(null)} title={`Refund from ticket ${ticket.number}`} className="tr-refund-dialog">
        {open === 'refund' && <RefundForm ticket={ticket} onDone={() => setOpen(null)} />}
      </Dialog>
    </section>
  );
}

function VoidForm({ ticket, onDone }: { ticket: Ticket; onDone: () => void }) {
  const voidTicket = useVoidTicket(ticket.id);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (reason.trim() === '') return setProblem('Say why the ticket is voided.');
    voidTicket.mutate(reason.trim(), {
      onSuccess: () => {
        void showToast({ intent: Intent.SUCCESS, message: `Ticket ${ticket.number} voided.` });
        onDone();
      },
      onError: (error) => setProblem(fieldProblems(error).reason ?? errorMessage(error)),
    });
  };
  return (
    <form onSubmit={submit} noValidate>
      <DialogBody>
        <p>A voided ticket stays on the day’s list, marked void, and counts for nothing.</p>
        <FormGroup label="Reason" labelFor="void-reason" helperText={problem} intent={problem ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="void-reason" autoFocus value={reason} onValueChange={(value) => {
              setReason(value);
              setProblem(null);
            }}
          />
        </FormGroup>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Keep the ticket" onClick={onDone} disabled={voidTicket.isPending} />
            <Button type="submit" intent={Intent.DANGER} loading={voidTicket.isPending} text="Void ticket" />
          </>
        }
      />
    </form>
  );
}

/** What can still be given back: services not yet refunded, and items not yet returned. */
function refundChoices(ticket: Ticket) {
  const refundedLines = new Set(ticket.serviceLines.map((l) => l.refundOfLineId).filter((id) => id !== null));
  const services = ticket.serviceLines.filter((l) => l.refundOfLineId === null && !refundedLines.has(l.id));
  const retail = ticket.retailLines
    .filter((l) => l.refundOfLineId === null)
    .map((line) => ({
      line,
      remaining: line.quantity + ticket.retailLines.filter((r) => r.refundOfLineId === line.id).reduce((n, r) => n + r.quantity, 0),
    }))
    .filter((choice) => choice.remaining > 0);
  return { services, retail };
}

function RefundForm({ ticket, onDone }: { ticket: Ticket; onDone: () => void }) {
  const refund = useRefundTicket(ticket.id);
  const { services, retail } = refundChoices(ticket);
  const [lineIds, setLineIds] = useState<string[]>([]);
  const [quantities, setQuantities] = useState<Record<string, string>>({});
  const [method, setMethod] = useState<NewRefund['method']>(ticket.payments.some((p) => p.method === 'card' && p.status === 'succeeded') ? 'card' : 'cash');
  const [reason, setReason] = useState('');
  const [key, setKey] = useState(newCheckoutKey);
  const [problems, setProblems] = useState<Problems>({});
  const [refusal, setRefusal] = useState<string | null>(null);

  const items = retail
    .map(({ line, remaining }) => ({ line, remaining, quantity: /^\d+$/.test(quantities[line.id] ?? '') ? Number(quantities[line.id]) : 0 }))
    .filter((item) => item.quantity > 0);
  // The same figures the server books: service prices, and each returned item's amount and tax per line.
  const amount = sumMoney([
    ...services.filter((l) => lineIds.includes(l.id)).map((l) => l.price),
    ...items.flatMap(({ line, quantity }) => {
      const figures = retailLineAmounts({ quantity, unitPrice: line.unitPrice, taxRate: line.taxRate });
      return [figures.amount, figures.tax];
    }),
  ]);
  const tooMany = items.find((item) => item.quantity > item.remaining);

  const changed = () => {
    setKey(newCheckoutKey());
    setRefusal(null);
    setProblems({});
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (signOf(amount) <= 0) return setRefusal('Choose at least one service or item to refund.');
    if (tooMany) return setRefusal(`Only ${tooMany.remaining} of ${tooMany.line.productName} can still be returned.`);
    if (reason.trim().length === 0) return setProblems({ reason: 'Say why the money goes back.' });
    refund.mutate(
      { serviceLineIds: lineIds, retail: items.map(({ line, quantity }) => ({ retailLineId: line.id, quantity })), method, reason: reason.trim(), idempotencyKey: key },
      {
        onSuccess: () => {
          void showToast({ intent: Intent.SUCCESS, message: `${amount} refunded ${method === 'card' ? 'to the card' : 'in cash'}.` });
          onDone();
        },
        onError: (error) => {
          const unknown = !(error instanceof ApiError) || error.status === 0 || error.status >= 500;
          if (!unknown) setKey(newCheckoutKey());
          setProblems(fieldProblems(error));
          setRefusal(errorMessage(error));
        },
      },
    );
  };

  return (
    <form onSubmit={submit} noValidate>
      <DialogBody>
        <p className="tr-muted">A refund is booked on today’s date as negative lines; the ticket’s own day stays as it was.</p>
        {services.length > 0 && (
          <fieldset className="tr-fieldset">
            <legend>Services</legend>
            {services.map((line) => (
              <Checkbox
                key={line.id}
                className="tr-ticket-check"
                checked={lineIds.includes(line.id)}
                onChange={(event) => {
                  const checked = event.currentTarget.checked;
                  setLineIds((current) => (checked ? [...current, line.id] : current.filter((id) => id !== line.id)));
                  changed();
                }}
              >
                <span className="tr-refund-choice">
                  {line.serviceName} · {line.staffName} <span className="tr-figure">{line.price}</span>
                </span>
              </Checkbox>
            ))}
          </fieldset>
        )}
        {retail.length > 0 && (
          <fieldset className="tr-fieldset">
            <legend>Items returned</legend>
            {retail.map(({ line, remaining }) => (
              <FormGroup key={line.id} inline label={`${line.productName} (up to ${remaining})`} labelFor={`refund-${line.id}`}>
                <InputGroup
                  id={`refund-${line.id}`}
                  inputMode="numeric"
                  className="tr-figure-input tr-qty-input"
                  placeholder="0"
                  value={quantities[line.id] ?? ''}
                  onValueChange={(value) => {
                    setQuantities((current) => ({ ...current, [line.id]: value.replace(/\D/g, '') }));
                    changed();
                  }}
                />
              </FormGroup>
            ))}
          </fieldset>
        )}
        <RadioGroup
          label="Money goes back"
          inline
          selectedValue={method}
          onChange={(event) => {
            setMethod(event.currentTarget.value as NewRefund['method']);
            changed();
          }}
        >
          <Radio value="card" label="To the card" />
          <Radio value="cash" label="In cash from the drawer" />
        </RadioGroup>
        {problems.method && <p className="tr-field-problem">{problems.method}</p>}
        <FormGroup label="Reason" labelFor="refund-reason" helperText={problems.reason} intent={problems.reason ? Intent.DANGER : Intent.NONE}>
          <TextArea id="refund-reason" fill rows={2} value={reason} onChange={(event) => setReason(event.currentTarget.value)} />
        </FormGroup>
        <p className="tr-refund-total">
          Refund <span className="tr-figure">{amount}</span>
        </p>
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert">
            {refusal}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={refund.isPending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={refund.isPending} text={`Refund ${amount}`} />
          </>
        }
      />
    </form>
  );
}
