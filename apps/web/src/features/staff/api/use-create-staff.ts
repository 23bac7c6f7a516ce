import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { staffKeys } from './staff-queries';

export type NewStaffMember = components['schemas']['CreateStaffDto'];

export function useCreateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewStaffMember) => expectData(http.POST('/api/staff', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
