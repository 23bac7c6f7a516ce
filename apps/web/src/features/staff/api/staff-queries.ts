import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type StaffMember = components['schemas']['StaffView'];
export type Level = components['schemas']['LevelView'];

export const staffKeys = {
  all: ['staff'] as const,
  list: (branchId: string | null) => [...staffKeys.all, 'list', branchId] as const,
  levels: () => [...staffKeys.all, 'levels'] as const,
};

export const staffQueries = {
  /** Everyone the caller may see, active or not; `branchId` narrows to one home branch. */
  list: (branchId: string | null) =>
    queryOptions({
      queryKey: staffKeys.list(branchId),
      queryFn: () => expectData(http.GET('/api/staff', { params: { query: branchId ? { branchId } : {} } })),
    }),
  levels: () =>
    queryOptions({
      queryKey: staffKeys.levels(),
      queryFn: () => expectData(http.GET('/api/catalogue/levels')),
      staleTime: 5 * 60_000,
    }),
};
