import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewServiceLine = components['schemas']['AddServiceLineDto'];

export function useAddServiceLine(ticketId: string) {
  return useTicketMutation((body: NewServiceLine) => expectData(http.POST('/api/tickets/{id}/service-lines', { params: { path: { id: ticketId } }, body })));
}
