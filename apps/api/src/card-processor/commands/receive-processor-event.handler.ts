import { CommandHandler, EventBus, type ICommandHandler } from '@nestjs/cqrs';
import type Stripe from 'stripe';
import { Database } from '../../database/database.js';
import { CardProcessor } from '../card-processor.js';
import { declineMessage } from '../decline-message.js';
import type { ProcessorEventReceipt } from '../dto/processor-event-receipt.view.js';
import { CardPaymentSettled } from '../events/card-payment-settled.js';
import { CardRefundSettled } from '../events/card-refund-settled.js';
import { fromMinorUnits } from '../minor-units.js';
import { ProcessorEventsRepository } from '../processor-events.repository.js';
import { ReceiveProcessorEventCommand } from './receive-processor-event.command.js';

type Settlement = CardPaymentSettled | CardRefundSettled;

/**
 * Verifies a webhook event, records its id (the processor delivers at least once) and publishes what it settles.
 * Processor events are not our commands, so no domain_events row: processor_events is their log.
 */
@CommandHandler(ReceiveProcessorEventCommand)
export class ReceiveProcessorEventHandler implements ICommandHandler<ReceiveProcessorEventCommand> {
  constructor(
    private readonly database: Database,
    private readonly processorEvents: ProcessorEventsRepository,
    private readonly cardProcessor: CardProcessor,
    private readonly eventBus: EventBus,
  ) {}

  async execute({ rawBody, signature }: ReceiveProcessorEventCommand): Promise<ProcessorEventReceipt> {
    const event = this.cardProcessor.verifyEvent(rawBody, signature);
    if (await this.processorEvents.seen(event.id)) return { received: true, duplicate: true };
    // Asking the processor about refunds is a network call: done before the transaction, which holds PGlite.
    const settlements = await this.settlementsOf(event);
    const recorded = await this.database.transaction(async () => {
      const isNew = await this.processorEvents.record(event.id, event.type);
      if (isNew) for (const settlement of settlements) this.database.afterCommit(() => this.eventBus.publish(settlement));
      return isNew;
    });
    return { received: true, duplicate: !recorded };
  }

  private async settlementsOf(event: Stripe.Event): Promise<Settlement[]> {
    switch (event.type) {
      case 'payment_intent.succeeded': {
        const intent = event.data.object;
        return [
          new CardPaymentSettled(intent.id, 'succeeded', fromMinorUnits(intent.amount_received, intent.currency), intent.currency.toUpperCase(), { ...intent.metadata }, null, event.id),
        ];
      }
      case 'payment_intent.payment_failed': {
        const intent = event.data.object;
        const error = intent.last_payment_error;
        const message = declineMessage(error?.decline_code || error?.code);
        return [new CardPaymentSettled(intent.id, 'failed', fromMinorUnits(intent.amount, intent.currency), intent.currency.toUpperCase(), { ...intent.metadata }, message, event.id)];
      }
      case 'charge.refunded': {
        // The charge in the event no longer lists its refunds (API versions since 2022-11-15), so ask for them.
        const charge = event.data.object;
        const paymentId = idOf(charge.payment_intent);
        if (!paymentId) return [];
        const refunds = await this.cardProcessor.refundsOfCharge(charge.id);
        return refunds.flatMap((refund) =>
          refund.status === 'pending' ? [] : [new CardRefundSettled(paymentId, refund.processorRefundId, refund.amount, refund.currency, refund.status, event.id)],
        );
      }
      case 'charge.refund.updated': {
        const refund = event.data.object;
        const paymentId = idOf(refund.payment_intent);
        const status = refund.status === 'succeeded' ? 'succeeded' : refund.status === 'failed' || refund.status === 'canceled' ? 'failed' : null;
        if (!paymentId || !status) return [];
        return [new CardRefundSettled(paymentId, refund.id, fromMinorUnits(refund.amount, refund.currency), refund.currency.toUpperCase(), status, event.id)];
      }
      default:
        return [];
    }
  }
}

function idOf(value: string | { id: string } | null): string | null {
  return typeof value === 'string' ? value : (value?.id ?? null);
}
