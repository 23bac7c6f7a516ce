import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useRemoveBowl(ticketId: string) {
  return useTicketMutation((bowlId: string) => expectData(http.DELETE('/api/tickets/{id}/bowls/{bowlId}', { params: { path: { id: ticketId, bowlId } } })));
}
