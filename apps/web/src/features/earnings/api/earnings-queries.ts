import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type MyEarnings = components['schemas']['MyEarningsView'];
export type EarningsDay = components['schemas']['EarningsDayView'];
export type EarningsStatement = components['schemas']['EarningsStatementView'];
export type EarningsTierProgress = components['schemas']['EarningsTierProgressView'];

export const earningsKeys = {
  all: ['earnings'] as const,
  mine: () => [...earningsKeys.all, 'me'] as const,
};

export const earningsQueries = {
  mine: () =>
    queryOptions({
      queryKey: earningsKeys.mine(),
      queryFn: () => expectData(http.GET('/api/payroll/earnings/me')),
      // A day close during the shift moves the figures on.
      staleTime: 60_000,
    }),
};
