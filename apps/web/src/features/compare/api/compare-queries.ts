import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import type { CompareRange } from '../components/compare-range';
import type { DateRange } from '../components/date-ranges';

export type BranchFigures = components['schemas']['BranchFiguresView'];
export type BranchComparison = components['schemas']['BranchComparisonView'];
export type BranchTrend = components['schemas']['BranchTrendView'];
export type BranchDays = components['schemas']['BranchDaysView'];
export type BranchStylists = components['schemas']['BranchStylistsView'];
export type FeeRow = components['schemas']['FeeStatementRowView'];
export type FeeStatements = components['schemas']['FeeStatementsView'];
export type CompareDefinitions = components['schemas']['CompareDefinitionsView'];

export const compareKeys = {
  all: ['compare'] as const,
  branches: (range: CompareRange) => [...compareKeys.all, 'branches', range.from, range.to, range.rebookingDays] as const,
  trend: (range: DateRange) => [...compareKeys.all, 'trend', range.from, range.to] as const,
  days: (branchId: string, range: DateRange) => [...compareKeys.all, 'days', branchId, range.from, range.to] as const,
  stylists: (branchId: string, range: DateRange) => [...compareKeys.all, 'stylists', branchId, range.from, range.to] as const,
  fees: (month: string) => [...compareKeys.all, 'fees', month] as const,
  definitions: () => [...compareKeys.all, 'definitions'] as const,
  payCalendar: () => [...compareKeys.all, 'pay-calendar'] as const,
};

export const compareQueries = {
  branches: (range: CompareRange) =>
    queryOptions({
      queryKey: compareKeys.branches(range),
      queryFn: () => expectData(http.GET('/api/compare/branches', { params: { query: range } })),
    }),
  trend: ({ from, to }: DateRange) =>
    queryOptions({
      queryKey: compareKeys.trend({ from, to }),
      queryFn: () => expectData(http.GET('/api/compare/trend', { params: { query: { from, to } } })),
    }),
  days: (branchId: string, { from, to }: DateRange) =>
    queryOptions({
      queryKey: compareKeys.days(branchId, { from, to }),
      queryFn: () => expectData(http.GET('/api/compare/branches/{branchId}/days', { params: { path: { branchId }, query: { from, to } } })),
    }),
  stylists: (branchId: string, { from, to }: DateRange) =>
    queryOptions({
      queryKey: compareKeys.stylists(branchId, { from, to }),
      queryFn: () => expectData(http.GET('/api/compare/branches/{branchId}/stylists', { params: { path: { branchId }, query: { from, to } } })),
    }),
  fees: (month: string) =>
    queryOptions({
      queryKey: compareKeys.fees(month),
      queryFn: () => expectData(http.GET('/api/compare/fees', { params: { query: { month } } })),
    }),
  /** How each figure is counted, in the API's words: one source for headers, tooltips and workbooks. */
  definitions: () =>
    queryOptions({
      queryKey: compareKeys.definitions(),
      queryFn: () => expectData(http.GET('/api/compare/definitions')),
      staleTime: Infinity,
    }),
  /** The pay calendar, for the "last pay period" preset; it holds no pay figures, so everyone may read it. */
  payCalendar: () =>
    queryOptions({
      queryKey: compareKeys.payCalendar(),
      queryFn: () => expectData(http.GET('/api/payroll/periods')),
      select: (view) => (view.schedule ? { frequency: view.schedule.frequency, anchorDate: view.schedule.anchorDate, workweekStartsOn: view.schedule.workweekStartsOn } : null),
      staleTime: 10 * 60_000,
    }),
};
