import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { dayCloseKeys } from './day-close-queries';

export type NewAdjustment = components['schemas']['AddAdjustmentDto'];

export function useAddAdjustment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewAdjustment) => expectData(http.POST('/api/day-close/adjustments', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: dayCloseKeys.all }),
  });
}
