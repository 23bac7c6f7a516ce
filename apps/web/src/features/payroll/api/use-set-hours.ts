import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { timesheetKeys } from './timesheet-queries';

export type HoursOfDay = components['schemas']['SetTimesheetHoursDto'];

/** Sets one staff member's hours for one day at one branch; "0" clears the day. */
export function useSetHours(periodId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: HoursOfDay) => expectData(http.PUT('/api/payroll/timesheets', { body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: timesheetKeys.entries(periodId) }),
  });
}
