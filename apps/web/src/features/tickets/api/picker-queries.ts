import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type Service = components['schemas']['ServiceView'];
export type Product = components['schemas']['ProductView'];
export type StaffMember = components['schemas']['StaffView'];

// The menu, the products and the people change rarely during a day; the ticket itself changes often.
const fiveMinutes = 5 * 60_000;

export const pickerKeys = {
  all: ['ticket-pickers'] as const,
  services: () => [...pickerKeys.all, 'services'] as const,
  products: () => [...pickerKeys.all, 'products'] as const,
  staff: (branchId: string) => [...pickerKeys.all, 'staff', branchId] as const,
};

export const pickerQueries = {
  services: () =>
    queryOptions({
      queryKey: pickerKeys.services(),
      queryFn: () => expectData(http.GET('/api/catalogue/services', { params: { query: { active: true } } })),
      staleTime: fiveMinutes,
    }),
  products: () =>
    queryOptions({
      queryKey: pickerKeys.products(),
      queryFn: () => expectData(http.GET('/api/catalogue/products', { params: { query: { active: true } } })),
      staleTime: fiveMinutes,
    }),
  staff: (branchId: string) =>
    queryOptions({
      queryKey: pickerKeys.staff(branchId),
      queryFn: () => expectData(http.GET('/api/staff', { params: { query: { branchId, active: true } } })),
      staleTime: fiveMinutes,
    }),
};
