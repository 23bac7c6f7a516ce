import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type ServiceChanges = components['schemas']['UpdateServiceDto'];

export function useUpdateService() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: ServiceChanges }) =>
      expectData(http.PATCH('/api/catalogue/services/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
