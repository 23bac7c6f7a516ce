import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { payPlanKeys } from './pay-plan-queries';

export type PayScheduleSettings = components['schemas']['SetPayScheduleDto'];

export function useSetPaySchedule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PayScheduleSettings) => expectData(http.PUT('/api/payroll/schedule', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payPlanKeys.feature }),
  });
}
