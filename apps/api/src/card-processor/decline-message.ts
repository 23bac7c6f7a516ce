// Our own words for the front desk. Lost and stolen cards get the plain decline, as the processor advises
// (its decline-code docs, from memory), so the desk never tells a cardholder why.
const DECLINE_MESSAGES: Record<string, string> = {
  insufficient_funds: 'The card was declined: not enough funds.',
  expired_card: 'The card has expired.',
  incorrect_cvc: 'The card’s security code is wrong.',
  incorrect_number: 'The card number is wrong.',
  processing_error: 'The card could not be processed; try again.',
};

export function declineMessage(code: string | undefined): string {
  return (code && DECLINE_MESSAGES[code]) || 'The card was declined.';
}
