import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewTip = components['schemas']['AddTipDto'];

export function useAddTip(ticketId: string) {
  return useTicketMutation((body: NewTip) => expectData(http.POST('/api/tickets/{id}/tips', { params: { path: { id: ticketId } }, body })));
}
