import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { todayKeys } from './today-queries';

export type NewTicket = components['schemas']['OpenTicketDto'];

export function useOpenTicket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewTicket) => expectData(http.POST('/api/tickets', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: todayKeys.all }),
  });
}
