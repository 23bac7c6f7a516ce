import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type NewService = components['schemas']['CreateServiceDto'];

export function useCreateService() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewService) => expectData(http.POST('/api/catalogue/services', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
