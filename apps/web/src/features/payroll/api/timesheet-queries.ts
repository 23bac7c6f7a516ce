import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type TimesheetEntry = components['schemas']['TimesheetEntryView'];
export type TimesheetImport = components['schemas']['TimesheetImportView'];
export type TimesheetImportRow = components['schemas']['TimesheetImportRowView'];
export type StaffMember = components['schemas']['StaffView'];

export const timesheetKeys = {
  all: ['payroll', 'timesheets'] as const,
  entries: (periodId: string) => [...timesheetKeys.all, 'entries', periodId] as const,
  staff: (branchId: string) => [...timesheetKeys.all, 'staff', branchId] as const,
};

export const timesheetQueries = {
  entries: (periodId: string) =>
    queryOptions({
      queryKey: timesheetKeys.entries(periodId),
      queryFn: () => expectData(http.GET('/api/payroll/periods/{id}/timesheets', { params: { path: { id: periodId } } })),
    }),
  /** Everyone whose home branch this is: the grid's rows, beside anyone with hours entered there. */
  staff: (branchId: string) =>
    queryOptions({
      queryKey: timesheetKeys.staff(branchId),
      queryFn: () => expectData(http.GET('/api/staff', { params: { query: { branchId } } })),
      staleTime: 5 * 60_000,
    }),
};
