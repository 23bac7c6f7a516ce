import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, ticketTotals } from '@tressury/domain';
import type { PaymentRow } from '@tressury/schema';
import Big from 'big.js';
import { CardProcessorUnavailableError } from '../../card-processor/card-processor-errors.js';
import { CardProcessor } from '../../card-processor/card-processor.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import type { TicketView } from '../dto/ticket.view.js';
import { PaymentSettled, PaymentTaken } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { invalidReference } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { TakePaymentCommand } from './take-payment.command.js';

const declined = (message: string | undefined) => new DomainError('payment.declined', message ?? 'The card was declined.', 'conflict');

/**
 * Cash settles at once. A card payment is recorded as pending first, then charged through the card
 * processor outside any transaction (PGlite holds the whole database during one), then settled. The
 * processor's idempotency key is derived from our payment row, so a repeated submission with the same
 * checkout key charges the card once.
 */
@CommandHandler(TakePaymentCommand)
export class TakePaymentHandler implements ICommandHandler<TakePaymentCommand> {
  constructor(
    private readonly database: Database,
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly events: EventLog,
    private readonly processor: CardProcessor,
  ) {}

  async execute({ user, ticketId, input }: TakePaymentCommand): Promise<TicketView> {
    const { payment, currency, branchId } = await this.database.transaction(async () => {
      const loaded = await this.editing.check(user, ticketId, 'pay');
      const existing = await this.tickets.findPaymentByKey(ticketId, input.idempotencyKey);
      if (existing) {
        if (existing.method !== input.method || !new Big(existing.amount).eq(input.amount)) {
          throw new DomainError('payment.key_reused', 'That checkout key was already used for a different payment.', 'conflict', 'idempotencyKey');
        }
        return { payment: existing, currency: loaded.branch.currency, branchId: loaded.branch.id };
      }
      const { due } = ticketTotals(loaded);
      if (new Big(input.amount).gt(due)) throw invalidReference('amount', `The amount is more than the ${due} still due.`);
      if (input.method === 'cash' && input.tendered !== undefined && new Big(input.tendered).lt(input.amount)) {
        throw invalidReference('tendered', 'The cash handed over is less than the amount.');
      }
      const row = await this.tickets.insertPayment({
        ticketId,
        method: input.method,
        kind: 'charge',
        status: input.method === 'cash' ? 'succeeded' : 'pending',
        amount: input.amount,
        tendered: input.method === 'cash' ? (input.tendered ?? null) : null,
        idempotencyKey: input.idempotencyKey,
        bookedOn: loaded.ticket.businessDate,
        takenById: user.id,
      });
      await this.events.append(new PaymentTaken(user.organisationId, ticketId, user.id, { payment: row }));
      return { payment: row, currency: loaded.branch.currency, branchId: loaded.branch.id };
    });

    const settled: PaymentRow & { failureMessage?: string } =
      payment.method === 'card' && payment.status === 'pending' ? await this.charge(user.organisationId, user.id, payment, input.paymentMethod!, currency, branchId) : payment;
    if (settled.status === 'failed') throw declined(settled.failureMessage);
    return this.editing.view(user.organisationId, ticketId);
  }

  private async charge(
    organisationId: string,
    actorId: string,
    payment: PaymentRow,
    paymentMethod: string,
    currency: string,
    branchId: string,
  ): Promise<PaymentRow & { failureMessage?: string }> {
    let result: Awaited<ReturnType<CardProcessor['charge']>>;
    try {
      result = await this.processor.charge({
        amount: payment.amount,
        currency,
        paymentMethod,
        idempotencyKey: `tressury-payment-${payment.id}`,
        metadata: { paymentId: payment.id, ticketId: payment.ticketId, branchId, organisationId },
      });
    } catch (error) {
      // Unreachable: whether the card was charged is unknown, so the payment stays pending for a retry
      // with the same checkout key (or for the processor's webhook).
      if (error instanceof CardProcessorUnavailableError) throw error;
      // Refused outright (e.g. below the smallest card amount): this attempt failed.
      await this.database.transaction(async () => {
        await this.tickets.updatePayment(payment.id, { status: 'failed' });
        await this.events.append(new PaymentSettled(organisationId, payment.ticketId, actorId, { paymentId: payment.id, status: 'failed' }));
      });
      throw error;
    }
    return this.database.transaction(async () => {
      if (result.status === 'pending') return payment;
      const updated = await this.tickets.updatePayment(payment.id, { status: result.status, processorPaymentId: result.processorPaymentId });
      await this.events.append(new PaymentSettled(organisationId, payment.ticketId, actorId, { paymentId: payment.id, status: result.status }));
      return { ...updated, failureMessage: result.message };
    });
  }
}
