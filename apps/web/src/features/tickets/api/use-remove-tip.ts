import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useRemoveTip(ticketId: string) {
  return useTicketMutation((tipId: string) => expectData(http.DELETE('/api/tickets/{id}/tips/{tipId}', { params: { path: { id: ticketId, tipId } } })));
}
