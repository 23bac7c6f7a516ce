import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type OutboundMessage = components['schemas']['OutboundMessageView'];

export const OUTBOX_PAGE_SIZE = 50;

export type OutboxPage = { messages: OutboundMessage[]; hasMore: boolean };

export const outboxKeys = {
  all: ['outbox'] as const,
  page: (page: number) => [...outboxKeys.all, 'page', page] as const,
};

export const outboxQueries = {
  /** One page, newest first; one extra row is asked for to tell whether another page follows. */
  page: (page: number) =>
    queryOptions({
      queryKey: outboxKeys.page(page),
      queryFn: async (): Promise<OutboxPage> => {
        const rows = await expectData(http.GET('/api/mail/outbox', { params: { query: { limit: OUTBOX_PAGE_SIZE + 1, offset: (page - 1) * OUTBOX_PAGE_SIZE } } }));
        return { messages: rows.slice(0, OUTBOX_PAGE_SIZE), hasMore: rows.length > OUTBOX_PAGE_SIZE };
      },
    }),
};
