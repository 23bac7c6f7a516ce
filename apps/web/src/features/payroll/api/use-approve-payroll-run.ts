import { useMutation, useQueryClient } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';
import { payrollRunKeys } from './payroll-run-queries';

/** Freezes a draft run: its figures can no longer change. */
export function useApprovePayrollRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (runId: string) => expectData(http.POST('/api/payroll/runs/{id}/approve', { params: { path: { id: runId } } })),
    onSuccess: async (run) => {
      queryClient.setQueryData(payrollRunKeys.run(run.id), run);
      await queryClient.invalidateQueries({ queryKey: payrollRunKeys.all, predicate: (query) => query.queryKey[2] !== 'run' });
    },
  });
}
