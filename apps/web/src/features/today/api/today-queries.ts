import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type TicketSummary = components['schemas']['TicketSummaryView'];
export type Client = components['schemas']['ClientView'];

export const todayKeys = {
  all: ['today'] as const,
  tickets: (branchId: string, date: string) => [...todayKeys.all, 'tickets', branchId, date] as const,
  clients: (search: string) => [...todayKeys.all, 'clients', search] as const,
};

export const todayQueries = {
  tickets: (branchId: string, date: string) =>
    queryOptions({
      queryKey: todayKeys.tickets(branchId, date),
      queryFn: () => expectData(http.GET('/api/tickets', { params: { query: { branchId, date } } })),
      // The floor changes all day, from several desks and chairs: fresh on every visit and every half minute.
      staleTime: 0,
      refetchInterval: 30_000,
    }),
  clients: (search: string) =>
    queryOptions({
      queryKey: todayKeys.clients(search),
      queryFn: () => expectData(http.GET('/api/clients', { params: { query: { search, limit: 8 } } })),
      enabled: search.length >= 2,
    }),
};
