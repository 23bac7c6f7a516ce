import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { payPlanKeys } from './pay-plan-queries';

export type NewPayPlan = components['schemas']['CreatePayPlanDto'];

export function useCreatePayPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewPayPlan) => expectData(http.POST('/api/payroll/plans', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payPlanKeys.all }),
  });
}
