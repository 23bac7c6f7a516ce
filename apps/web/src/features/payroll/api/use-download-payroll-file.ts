import { useMutation, useQueryClient } from '@tanstack/react-query';
import { downloadFile } from '../../../lib/download';
import { http } from '../../../lib/http';
import { payrollRunKeys } from './payroll-run-queries';

export type PayrollFileKind = 'workbook' | 'summary';

/** Fetches an approved run's workbook or summary CSV with the signed-in token and saves it under the server's file name. */
export function useDownloadPayrollFile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ runId, kind }: { runId: string; kind: PayrollFileKind }): Promise<string> => {
      const options = { params: { path: { id: runId } }, parseAs: 'blob' as const };
      return downloadFile(
        () => (kind === 'workbook' ? http.GET('/api/payroll/runs/{id}/workbook', options) : http.GET('/api/payroll/runs/{id}/summary.csv', options)),
        kind === 'workbook' ? 'payroll.xlsx' : 'payroll-summary.csv',
      );
    },
    // The first download marks the run exported.
    onSuccess: (_name, { runId }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: payrollRunKeys.run(runId) }), queryClient.invalidateQueries({ queryKey: payrollRunKeys.periods() })]),
  });
}
