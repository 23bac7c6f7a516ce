import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type Ticket = components['schemas']['TicketView'];
export type ServiceLine = components['schemas']['ServiceLineView'];
export type Bowl = components['schemas']['BowlView'];
export type RetailLine = components['schemas']['RetailLineView'];
export type Tip = components['schemas']['TipView'];
export type Payment = components['schemas']['PaymentView'];

export const ticketKeys = {
  all: ['tickets'] as const,
  detail: (id: string) => [...ticketKeys.all, 'detail', id] as const,
};

export const ticketQueries = {
  detail: (id: string) =>
    queryOptions({
      queryKey: ticketKeys.detail(id),
      queryFn: () => expectData(http.GET('/api/tickets/{id}', { params: { path: { id } } })),
      // Stylist and desk work on the same ticket at once: look again every half minute while it is on screen.
      staleTime: 0,
      refetchInterval: 30_000,
    }),
};
