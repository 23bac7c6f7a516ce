import { EventsHandler, type IEventHandler } from '@nestjs/cqrs';
import { Logger } from '@nestjs/common';
import { CardPaymentSettled } from '../../card-processor/events/card-payment-settled.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { TicketsRepository } from '../tickets.repository.js';
import { PaymentSettled } from './ticket-events.js';

/** Settles a card payment the checkout left pending (e.g. the processor answered after a timeout). */
@EventsHandler(CardPaymentSettled)
export class CardPaymentSettledHandler implements IEventHandler<CardPaymentSettled> {
  private readonly logger = new Logger('CardPaymentSettled');

  constructor(
    private readonly database: Database,
    private readonly tickets: TicketsRepository,
    private readonly events: EventLog,
  ) {}

  async handle(event: CardPaymentSettled): Promise<void> {
    const paymentId = event.metadata.paymentId;
    const organisationId = event.metadata.organisationId;
    if (!paymentId || !organisationId) return;
    try {
      await this.database.transaction(async () => {
        const payment = await this.tickets.findPayment(paymentId);
        if (!payment || payment.status !== 'pending') return;
        await this.tickets.updatePayment(payment.id, { status: event.status, processorPaymentId: event.processorPaymentId });
        await this.events.append(new PaymentSettled(organisationId, payment.ticketId, null, { paymentId: payment.id, status: event.status, via: 'card processor' }));
      });
    } catch (error) {
      this.logger.error(`could not settle payment ${paymentId}: ${String(error)}`);
    }
  }
}
