import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type DayPreview = components['schemas']['DayPreviewView'];
export type DayClose = components['schemas']['DayCloseView'];

export const dayCloseKeys = {
  all: ['day-close'] as const,
  preview: (branchId: string, businessDate: string) => [...dayCloseKeys.all, 'preview', branchId, businessDate] as const,
  staff: (branchId: string) => [...dayCloseKeys.all, 'staff', branchId] as const,
  tickets: (branchId: string, date: string) => [...dayCloseKeys.all, 'tickets', branchId, date] as const,
};

export const dayCloseQueries = {
  preview: (branchId: string, businessDate: string) =>
    queryOptions({
      queryKey: dayCloseKeys.preview(branchId, businessDate),
      queryFn: () => expectData(http.GET('/api/day-close', { params: { query: { branchId, businessDate } } })),
      // Tickets keep closing while the manager counts the drawer.
      staleTime: 0,
      refetchInterval: 30_000,
    }),
  staff: (branchId: string) =>
    queryOptions({
      queryKey: dayCloseKeys.staff(branchId),
      queryFn: () => expectData(http.GET('/api/staff', { params: { query: { branchId } } })),
      staleTime: 5 * 60_000,
    }),
  tickets: (branchId: string, date: string) =>
    queryOptions({
      queryKey: dayCloseKeys.tickets(branchId, date),
      queryFn: () => expectData(http.GET('/api/tickets', { params: { query: { branchId, date } } })),
    }),
};
