import { useMutation, useQueryClient } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';
import { type PayPlanTerms, payPlanKeys } from './pay-plan-queries';

/** New terms for a plan from a pay period's first day; approved runs keep the terms they were computed with. */
export function useAddPayPlanVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ planId, terms }: { planId: string; terms: PayPlanTerms }) =>
      expectData(http.POST('/api/payroll/plans/{id}/versions', { params: { path: { id: planId } }, body: terms })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payPlanKeys.all }),
  });
}
