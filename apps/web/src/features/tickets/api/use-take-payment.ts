import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewPayment = components['schemas']['TakePaymentDto'];

export function useTakePayment(ticketId: string) {
  return useTicketMutation((body: NewPayment) => expectData(http.POST('/api/tickets/{id}/payments', { params: { path: { id: ticketId } }, body })));
}
