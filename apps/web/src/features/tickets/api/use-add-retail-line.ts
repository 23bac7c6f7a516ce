import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewRetailLine = components['schemas']['AddRetailLineDto'];

export function useAddRetailLine(ticketId: string) {
  return useTicketMutation((body: NewRetailLine) => expectData(http.POST('/api/tickets/{id}/retail-lines', { params: { path: { id: ticketId } }, body })));
}
