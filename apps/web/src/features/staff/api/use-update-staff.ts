import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { staffKeys } from './staff-queries';

export type StaffChanges = components['schemas']['UpdateStaffDto'];

export function useUpdateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: StaffChanges }) =>
      expectData(http.PATCH('/api/staff/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
