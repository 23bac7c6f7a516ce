import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useCloseTicket(ticketId: string) {
  return useTicketMutation(() => expectData(http.POST('/api/tickets/{id}/close', { params: { path: { id: ticketId } } })));
}
