import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type Branch = components['schemas']['BranchView'];

export const branchKeys = {
  all: ['branches'] as const,
  list: () => [...branchKeys.all, 'list'] as const,
};

export const branchQueries = {
  list: () =>
    queryOptions({
      queryKey: branchKeys.list(),
      queryFn: () => expectData(http.GET('/api/branches')),
    }),
};
