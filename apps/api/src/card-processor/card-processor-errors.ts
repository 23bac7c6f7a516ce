import { DomainError } from '@tressury/domain';

export const badSignature = () =>
  new DomainError('card_processor.bad_signature', 'The card processor event could not be verified; it was ignored.', 'invalid');

export const cardPaymentNotFound = () => new DomainError('card_processor.payment_not_found', 'The card processor has no such card payment.', 'not_found');

export const unknownPaymentMethod = () =>
  new DomainError('card_processor.unknown_payment_method', 'The card could not be read; try the card again.', 'invalid', 'paymentMethod');

export const attemptReused = () =>
  new DomainError(
    'card_processor.attempt_reused',
    'This payment attempt was already sent with different details; start a new attempt.',
    'conflict',
  );

export const amountTooSmall = () =>
  new DomainError('card_processor.amount_too_small', 'The amount is below the smallest card payment the card processor accepts.', 'invalid', 'amount');

export const refundTooLarge = () =>
  new DomainError('card_processor.refund_too_large', 'The refund is more than what is left of the card payment.', 'invalid', 'amount');

export const nothingToRefund = () =>
  new DomainError('card_processor.nothing_to_refund', 'This card payment has nothing left to refund.', 'conflict');

/**
 * The processor gave no usable answer (unreachable, timed out, refused our key or the request). Whether a card
 * was charged is then unknown: retrying with the same idempotency key is safe and gives the first outcome.
 */
export class CardProcessorUnavailableError extends Error {
  constructor(message: string, cause?: unknown) {
    super(message, { cause });
    this.name = 'CardProcessorUnavailableError';
  }
}
