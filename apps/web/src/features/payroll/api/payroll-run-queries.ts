import type { PayInput, PayResult } from '@tressury/domain';
import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type PayPeriods = components['schemas']['PayPeriodsView'];
export type PayPeriod = components['schemas']['PayPeriodView'];
export type PayrollRun = components['schemas']['PayrollRunView'];
export type PayrollLine = components['schemas']['PayrollLineView'];
// OpenAPI types the stored computation loosely; its shape is libs/domain's own.
export type PayrollLineDetail = Omit<components['schemas']['PayrollLineDetailView'], 'input' | 'result'> & { input: PayInput; result: PayResult };

/** How often a computing run is asked for its progress. */
export const RUN_POLL_MS = 700;

export const payrollRunKeys = {
  all: ['payroll', 'runs'] as const,
  periods: () => [...payrollRunKeys.all, 'periods'] as const,
  run: (runId: string) => [...payrollRunKeys.all, 'run', runId] as const,
  lines: (runId: string) => [...payrollRunKeys.all, 'lines', runId] as const,
  line: (runId: string, lineId: string) => [...payrollRunKeys.all, 'line', runId, lineId] as const,
};

export const payrollRunQueries = {
  periods: () =>
    queryOptions({
      queryKey: payrollRunKeys.periods(),
      queryFn: () => expectData(http.GET('/api/payroll/periods')),
    }),
  run: (runId: string) =>
    queryOptions({
      queryKey: payrollRunKeys.run(runId),
      queryFn: () => expectData(http.GET('/api/payroll/runs/{id}', { params: { path: { id: runId } } })),
      // Poll while the server computes; a finished run changes only through this app's own commands.
      refetchInterval: (query) => (query.state.data?.status === 'computing' ? RUN_POLL_MS : false),
      staleTime: 0,
    }),
  lines: (runId: string) =>
    queryOptions({
      queryKey: payrollRunKeys.lines(runId),
      queryFn: () => expectData(http.GET('/api/payroll/runs/{id}/lines', { params: { path: { id: runId } } })),
    }),
  line: (runId: string, lineId: string) =>
    queryOptions({
      queryKey: payrollRunKeys.line(runId, lineId),
      queryFn: async () =>
        (await expectData(http.GET('/api/payroll/runs/{id}/lines/{lineId}', { params: { path: { id: runId, lineId } } }))) as PayrollLineDetail,
    }),
};
