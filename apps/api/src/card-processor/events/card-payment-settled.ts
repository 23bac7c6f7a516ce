/** The card processor has finished a card payment: it went through or the card was declined. Published on the EventBus. */
export class CardPaymentSettled {
  constructor(
    readonly processorPaymentId: string,
    readonly status: 'succeeded' | 'failed',
    /** Decimal string in the payment's currency, e.g. "42.50". */
    readonly amount: string,
    /** ISO 4217, upper case. */
    readonly currency: string,
    /** What `CardProcessor.charge` was given as metadata (ticketId, branchId…). */
    readonly metadata: Record<string, string>,
    /** Why a card was declined, in words for the front desk. */
    readonly message: string | null,
    /** The processor's event id; a redelivered event is never published twice. */
    readonly processorEventId: string,
  ) {}
}
