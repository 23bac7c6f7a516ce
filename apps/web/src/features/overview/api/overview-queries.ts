import { queryOptions } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';

export const overviewKeys = {
  all: ['overview'] as const,
  me: () => [...overviewKeys.all, 'me'] as const,
};

export const overviewQueries = {
  // Fresh on each visit: the branches someone works in change when the owner adds one.
  me: () => queryOptions({ queryKey: overviewKeys.me(), queryFn: () => expectData(http.GET('/api/auth/me')), staleTime: 0 }),
};
