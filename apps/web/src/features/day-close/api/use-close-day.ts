import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { dayCloseKeys } from './day-close-queries';

export type NewDayClose = components['schemas']['CloseDayDto'];

export function useCloseDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewDayClose) => expectData(http.POST('/api/day-close', { body })),
    onSuccess: async (preview) => {
      queryClient.setQueryData(dayCloseKeys.preview(preview.branchId, preview.businessDate), preview);
      await queryClient.invalidateQueries({ queryKey: dayCloseKeys.all, predicate: (query) => query.queryKey[1] !== 'preview' || query.queryKey[3] !== preview.businessDate });
    },
  });
}
