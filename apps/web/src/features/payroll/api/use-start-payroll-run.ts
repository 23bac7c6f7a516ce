import { useMutation, useQueryClient } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';
import { payrollRunKeys } from './payroll-run-queries';

/** Starts the period's run (or runs a draft again); the server answers at once and computes in the background. */
export function useStartPayrollRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (periodId: string) => expectData(http.POST('/api/payroll/periods/{id}/runs', { params: { path: { id: periodId } } })),
    onSuccess: async (run) => {
      queryClient.setQueryData(payrollRunKeys.run(run.id), run);
      await queryClient.invalidateQueries({ queryKey: payrollRunKeys.all, predicate: (query) => query.queryKey[2] !== 'run' });
    },
  });
}
