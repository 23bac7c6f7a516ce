import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewRefund = components['schemas']['RefundTicketDto'];

export function useRefundTicket(ticketId: string) {
  return useTicketMutation((body: NewRefund) => expectData(http.POST('/api/tickets/{id}/refunds', { params: { path: { id: ticketId } }, body })));
}
