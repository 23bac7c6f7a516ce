import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type LevelChanges = components['schemas']['UpdateLevelDto'];

export function useUpdateLevel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: LevelChanges }) =>
      expectData(http.PATCH('/api/catalogue/levels/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
