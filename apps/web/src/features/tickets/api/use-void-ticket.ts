import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useVoidTicket(ticketId: string) {
  return useTicketMutation((reason: string) => expectData(http.POST('/api/tickets/{id}/void', { params: { path: { id: ticketId } }, body: { reason } })));
}
