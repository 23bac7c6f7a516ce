import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { useTicketMutation } from './ticket-mutation';

export type ServiceLineChanges = components['schemas']['UpdateServiceLineDto'];

export function useUpdateServiceLine(ticketId: string) {
  return useTicketMutation(({ lineId, changes }: { lineId: string; changes: ServiceLineChanges }) =>
    expectData(http.PATCH('/api/tickets/{id}/service-lines/{lineId}', { params: { path: { id: ticketId, lineId } }, body: changes })),
  );
}
