import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { branchKeys } from './branch-queries';

export type NewBranch = components['schemas']['CreateBranchDto'];

export function useCreateBranch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewBranch) => expectData(http.POST('/api/branches', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: branchKeys.all }),
  });
}
