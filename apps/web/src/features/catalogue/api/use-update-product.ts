import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type ProductChanges = components['schemas']['UpdateProductDto'];

export function useUpdateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: ProductChanges }) =>
      expectData(http.PATCH('/api/catalogue/products/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
