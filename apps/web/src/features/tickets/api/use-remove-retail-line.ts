import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useRemoveRetailLine(ticketId: string) {
  return useTicketMutation((lineId: string) => expectData(http.DELETE('/api/tickets/{id}/retail-lines/{lineId}', { params: { path: { id: ticketId, lineId } } })));
}
