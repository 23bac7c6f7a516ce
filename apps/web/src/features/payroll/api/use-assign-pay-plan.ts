import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { payPlanKeys } from './pay-plan-queries';

export type PlanAssignment = components['schemas']['AssignPayPlanDto'];

/** Puts one staff member on a plan from a pay period's first day. */
export function useAssignPayPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ planId, assignment }: { planId: string; assignment: PlanAssignment }) =>
      expectData(http.POST('/api/payroll/plans/{id}/assignments', { params: { path: { id: planId } }, body: assignment })),
    onSettled: () => queryClient.invalidateQueries({ queryKey: payPlanKeys.all }),
  });
}
