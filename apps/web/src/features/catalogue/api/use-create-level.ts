import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type NewLevel = components['schemas']['CreateLevelDto'];

export function useCreateLevel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewLevel) => expectData(http.POST('/api/catalogue/levels', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
