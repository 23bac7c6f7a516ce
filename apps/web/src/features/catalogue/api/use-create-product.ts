import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { catalogueKeys } from './catalogue-queries';

export type NewProduct = components['schemas']['CreateProductDto'];

export function useCreateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewProduct) => expectData(http.POST('/api/catalogue/products', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
