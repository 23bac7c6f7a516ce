import { useMutation, useQueryClient } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';
import { payrollRunKeys } from './payroll-run-queries';

/** Creates the pay period holding `date` (the next one after the latest when left out). */
export function useCreatePayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (date?: string) => expectData(http.POST('/api/payroll/periods', { body: date ? { date } : {} })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payrollRunKeys.periods() }),
  });
}
