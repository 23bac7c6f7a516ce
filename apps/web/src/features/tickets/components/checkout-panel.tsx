import { Button, Callout, FormGroup, H2, HTMLSelect, InputGroup, Intent, SegmentedControl, Tag } from '@blueprintjs/core';
import { ConfirmIcon, CreditCardIcon, DollarIcon } from '@blueprintjs/icons';
import { cashChange, parseDecimal, roundMoney } from '@tressury/domain';
import { type FormEvent, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Payment, Ticket } from '../api/ticket-queries';
import { useCloseTicket } from '../api/use-close-ticket';
import { type NewPayment, useTakePayment } from '../api/use-take-payment';
import { newCheckoutKey } from './checkout-key';
import { closeBlockers } from './close-blockers';
import { fieldProblems, type Problems } from './field-problems';
import { signOf, typedDecimal } from './figures';
import type { TicketPermissions } from './ticket-permissions';

// The local card-processor fake's test payment methods; a real card reader is not part of this build.
const testCards = [
  { value: 'pm_card_visa', label: 'Test card — approves' },
  { value: 'pm_card_chargeDeclined', label: 'Test card — declines' },
] as const;

const paymentStates: Record<Payment['status'], { text: string; intent: Intent }> = {
  succeeded: { text: 'Taken', intent: Intent.SUCCESS },
  pending: { text: 'Waiting', intent: Intent.WARNING },
  failed: { text: 'Declined', intent: Intent.DANGER },
};

type Props = { ticket: Ticket; can: TicketPermissions };

export function CheckoutPanel({ ticket, can }: Props) {
  const { totals } = ticket;
  const owing = signOf(totals.due) > 0;
  return (
    <section className="tr-panel tr-checkout" aria-labelledby="ticket-checkout">
      <H2 id="ticket-checkout" className="tr-panel-title">
        Checkout
      </H2>
      <dl className="tr-figures tr-totals" aria-label="Totals">
        <dt>Services</dt>
        <dd>{totals.services}</dd>
        <dt>Retail</dt>
        <dd>{totals.retail}</dd>
        <dt>Tax</dt>
        <dd>{totals.tax}</dd>
        <dt>Tips</dt>
        <dd>{totals.tips}</dd>
        <dt className="tr-total">Total</dt>
        <dd className="tr-total">{totals.total}</dd>
        <dt>Paid</dt>
        <dd>{totals.paid}</dd>
        <dt className="tr-total">Due</dt>
        <dd className="tr-total" aria-label="Due">
          {totals.due}
        </dd>
      </dl>
      {ticket.payments.length > 0 && (
        <ul className="tr-payments" aria-label="Payments">
          {ticket.payments.map((payment) => (
            <li key={payment.id}>
              <span>
                {payment.kind === 'refund' ? 'Refund' : payment.method === 'cash' ? 'Cash' : 'Card'}
                {payment.change && signOf(payment.change) > 0 ? <span className="tr-muted"> · change {payment.change}</span> : null}
              </span>
              <Tag minimal intent={paymentStates[payment.status].intent}>
                {paymentStates[payment.status].text}
              </Tag>
              <span className="tr-figure">{payment.amount}</span>
            </li>
          ))}
        </ul>
      )}
      {can.takesPayment && owing && <PaymentForm key={ticket.id} ticket={ticket} />}
      {can.closes && <CloseTicket ticket={ticket} />}
    </section>
  );
}

function PaymentForm({ ticket }: { ticket: Ticket }) {
  const pay = useTakePayment(ticket.id);
  const due = ticket.totals.due;
  const [method, setMethod] = useState<NewPayment['method']>('card');
  const [typedAmount, setTypedAmount] = useState<string | null>(null);
  const [tendered, setTendered] = useState('');
  const [card, setCard] = useState<string>(testCards[0].value);
  const [key, setKey] = useState(newCheckoutKey);
  const [problems, setProblems] = useState<Problems>({});
  const [refusal, setRefusal] = useState<{ message: string; retry: boolean } | null>(null);
  // Until the person types an amount, the payment is for what is still due.
  const amountText = typedAmount ?? due;
  const amount = typedDecimal(amountText);
  const shown = amount === null ? '' : roundMoney(amount);

  // A changed attempt is a new attempt: it gets its own key.
  const changed = <T,>(set: (value: T) => void) => (value: T) => {
    set(value);
    setKey(newCheckoutKey());
    setProblems({});
    setRefusal(null);
  };

  let changeLine: { text: string; problem: boolean } | null = null;
  if (method === 'cash' && tendered.trim() !== '') {
    const handed = typedDecimal(tendered);
    if (handed === null || amount === null) changeLine = { text: 'Write the cash handed over as a number, such as 60 or 52.50.', problem: true };
    else {
      const change = cashChange(handed, amount);
      changeLine = signOf(change) < 0 ? { text: `That is ${change.slice(1)} short of the amount.`, problem: true } : { text: `Change to give: ${change}`, problem: false };
    }
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (amount === null || signOf(amount) <= 0) return setProblems({ amount: 'Give an amount more than 0.' });
    if (parseDecimal(amount, 'amount').gt(parseDecimal(due, 'due'))) return setProblems({ amount: `No more than the ${due} still due.` });
    if (changeLine?.problem) return setProblems({ tendered: changeLine.text });
    const body: NewPayment = {
      method,
      amount,
      idempotencyKey: key,
      ...(method === 'cash' ? (tendered.trim() ? { tendered: tendered.trim() } : {}) : { paymentMethod: card }),
    };
    setRefusal(null);
    pay.mutate(body, {
      onSuccess: () => {
        const change = method === 'cash' && body.tendered ? cashChange(body.tendered, amount) : null;
        void showToast({
          intent: Intent.SUCCESS,
          message: method === 'cash' ? `${shown} taken in cash${change && signOf(change) > 0 ? `; give ${change} change` : ''}.` : `${shown} charged to the card.`,
        });
        setTypedAmount(null);
        setTendered('');
        setKey(newCheckoutKey());
      },
      onError: (error) => {
        // Unknown outcome: the same attempt, with the same key, may be sent again and charges once.
        const unknown = !(error instanceof ApiError) || error.status === 0 || error.status >= 500 || error.code === 'payment.processor_unavailable';
        if (!unknown) setKey(newCheckoutKey());
        setProblems(fieldProblems(error));
        setRefusal({ message: errorMessage(error), retry: unknown });
      },
    });
  };

  return (
    <form className="tr-payment-form" onSubmit={submit} noValidate aria-label="Take a payment">
      <SegmentedControl
        fill
        aria-label="How the client pays"
        value={method}
        onValueChange={changed((value: string) => setMethod(value as NewPayment['method']))}
        options={[
          { value: 'card', label: 'Card', icon: <CreditCardIcon /> },
          { value: 'cash', label: 'Cash', icon: <DollarIcon /> },
        ]}
      />
      <FormGroup label="Amount" labelFor="payment-amount" helperText={problems.amount} intent={problems.amount ? Intent.DANGER : Intent.NONE}>
        <InputGroup id="payment-amount" inputMode="decimal" className="tr-figure-input" value={amountText} onValueChange={changed(setTypedAmount)} />
      </FormGroup>
      {method === 'cash' ? (
        <FormGroup
          label="Cash handed over"
          labelFor="payment-tendered"
          helperText={problems.tendered ?? (changeLine ? <span className={changeLine.problem ? 'tr-field-problem' : 'tr-change'}>{changeLine.text}</span> : 'Leave empty for the exact amount.')}
          intent={problems.tendered || changeLine?.problem ? Intent.DANGER : Intent.NONE}
        >
          <InputGroup id="payment-tendered" inputMode="decimal" className="tr-figure-input" value={tendered} onValueChange={changed(setTendered)} />
        </FormGroup>
      ) : (
        <FormGroup label="Card" labelFor="payment-card" helperText={problems.paymentMethod}>
          <HTMLSelect id="payment-card" fill value={card} onChange={(event) => changed(setCard)(event.currentTarget.value)}>
            {testCards.map((option) => (
              <option key={option.value} value={option.value}>
                {option.label}
              </option>
            ))}
          </HTMLSelect>
          <p className="tr-muted tr-small">The card reader integration is not part of this build: these test cards go to the local card-processor fake.</p>
        </FormGroup>
      )}
      {refusal && (
        <Callout intent={refusal.retry ? Intent.WARNING : Intent.DANGER} role="alert" className="tr-payment-refusal">
          {refusal.message}
          {refusal.retry && <> Sending it again repeats the same attempt, so the client is charged once.</>}
        </Callout>
      )}
      <Button
        type="submit"
        fill
        intent={Intent.PRIMARY}
        loading={pay.isPending}
        text={refusal?.retry ? 'Try again' : method === 'cash' ? `Take ${shown} in cash` : `Charge ${shown} to card`}
      />
    </form>
  );
}

function CloseTicket({ ticket }: { ticket: Ticket }) {
  const close = useCloseTicket(ticket.id);
  const blockers = closeBlockers(ticket);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <div className="tr-close-ticket">
      <Button
        fill
        intent={Intent.SUCCESS}
        icon={<ConfirmIcon />}
        text="Close ticket"
        disabled={blockers.length > 0}
        aria-describedby={blockers.length > 0 ? 'close-blockers' : undefined}
        loading={close.isPending}
        onClick={() =>
          close.mutate(undefined, {
            onSuccess: () => void showToast({ intent: Intent.SUCCESS, message: `Ticket ${ticket.number} closed.` }),
            onError: (error) => setRefusal(errorMessage(error)),
          })
        }
      />
      {blockers.length > 0 && (
        <div id="close-blockers" className="tr-close-blockers">
          <p>Before it can close:</p>
          <ul>
            {blockers.map((blocker) => (
              <li key={blocker}>{blocker}</li>
            ))}
          </ul>
        </div>
      )}
      {refusal && (
        <Callout intent={Intent.DANGER} role="alert">
          {refusal}
        </Callout>
      )}
    </div>
  );
}
