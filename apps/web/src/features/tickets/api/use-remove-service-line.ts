import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export function useRemoveServiceLine(ticketId: string) {
  return useTicketMutation((lineId: string) => expectData(http.DELETE('/api/tickets/{id}/service-lines/{lineId}', { params: { path: { id: ticketId, lineId } } })));
}
