import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type NewBowl = components['schemas']['RecordBowlDto'];
export type BowlComponentInput = components['schemas']['BowlComponentInput'];

export function useRecordBowl(ticketId: string) {
  return useTicketMutation((body: NewBowl) => expectData(http.POST('/api/tickets/{id}/bowls', { params: { path: { id: ticketId } }, body })));
}
