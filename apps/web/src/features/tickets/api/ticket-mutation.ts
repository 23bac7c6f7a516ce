import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type Ticket, ticketKeys } from './ticket-queries';

/**
 * Every ticket command answers with the whole ticket as it now stands: show that answer at once, and
 * mark the rest of the feature's data stale.
 */
export function useTicketMutation<Variables>(send: (variables: Variables) => Promise<Ticket>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: async (ticket) => {
      queryClient.setQueryData(ticketKeys.detail(ticket.id), ticket);
      await queryClient.invalidateQueries({ queryKey: ticketKeys.all, predicate: (query) => query.queryKey[2] !== ticket.id });
    },
  });
}
