import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type Client = components['schemas']['ClientView'];
export type ClientDetail = components['schemas']['ClientDetailView'];
export type PatchTest = components['schemas']['PatchTestView'];
export type Formula = components['schemas']['FormulaView'];
export type FormulaComponent = components['schemas']['FormulaComponentView'];

export const CLIENT_PAGE_SIZE = 25;
export const FORMULA_PAGE_SIZE = 20;

/** What the client list asks for; `page` counts from 1. */
export type ClientSearch = { search: string; branchId: string | null; page: number };

/** A branch's patch-test window and clock, for judging the tests listed on the client list. */
export type BranchWindow = { id: string; timeZone: string; patchTestMaxAgeDays: number };

export const clientKeys = {
  all: ['clients'] as const,
  list: (search: ClientSearch) => [...clientKeys.all, 'list', search] as const,
  detail: (id: string) => [...clientKeys.all, 'detail', id] as const,
  formulas: (id: string, page: number) => [...clientKeys.all, 'formulas', id, page] as const,
  branchWindows: () => [...clientKeys.all, 'branch-windows'] as const,
};

export const clientQueries = {
  list: ({ search, branchId, page }: ClientSearch) =>
    queryOptions({
      queryKey: clientKeys.list({ search, branchId, page }),
      queryFn: () =>
        expectData(
          http.GET('/api/clients', {
            params: {
              query: {
                ...(search ? { search } : {}),
                ...(branchId ? { branchId } : {}),
                limit: CLIENT_PAGE_SIZE,
                offset: (page - 1) * CLIENT_PAGE_SIZE,
              },
            },
          }),
        ),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: clientKeys.detail(id),
      queryFn: () => expectData(http.GET('/api/clients/{id}', { params: { path: { id } } })),
    }),
  formulas: (id: string, page: number) =>
    queryOptions({
      queryKey: clientKeys.formulas(id, page),
      queryFn: () =>
        expectData(
          http.GET('/api/clients/{id}/formulas', {
            params: { path: { id }, query: { limit: FORMULA_PAGE_SIZE, offset: (page - 1) * FORMULA_PAGE_SIZE } },
          }),
        ),
    }),
  // The list carries only the test date; each branch's window says whether it still covers colour.
  branchWindows: () =>
    queryOptions({
      queryKey: clientKeys.branchWindows(),
      queryFn: async (): Promise<BranchWindow[]> =>
        (await expectData(http.GET('/api/branches'))).map(({ id, timeZone, patchTestMaxAgeDays }) => ({ id, timeZone, patchTestMaxAgeDays })),
      staleTime: 5 * 60_000,
    }),
};
