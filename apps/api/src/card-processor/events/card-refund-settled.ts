/**
 * The card processor has refunded (part of) a card payment. Published on the EventBus. A later refund of the same
 * payment reports its earlier refunds again, so apply it idempotently by `processorRefundId`.
 */
export class CardRefundSettled {
  constructor(
    readonly processorPaymentId: string,
    readonly processorRefundId: string,
    /** Decimal string, positive: how much went back to the card. */
    readonly amount: string,
    /** ISO 4217, upper case. */
    readonly currency: string,
    readonly status: 'succeeded' | 'failed',
    /** The processor's event id; one event may report several refunds of the same payment. */
    readonly processorEventId: string,
  ) {}
}
