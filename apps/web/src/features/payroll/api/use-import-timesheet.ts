import { useMutation, useQueryClient } from '@tanstack/react-query';
import { expectData, http } from '../../../lib/http';
import { type TimesheetImport, timesheetKeys } from './timesheet-queries';

type Upload = { file: File; commit: boolean };

/**
 * Checks a timesheet file row by row (`commit` false), or writes every row of it at once (`commit` true; nothing
 * is written if any row is bad). The generated type reads `format: binary` as text, so the serializer sends the file.
 */
export function useImportTimesheet(periodId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, commit }: Upload): Promise<TimesheetImport> => {
      const form = new FormData();
      form.append('file', file);
      return expectData(
        http.POST('/api/payroll/periods/{id}/timesheets/import', {
          params: { path: { id: periodId }, query: { commit } },
          body: { file: file.name },
          bodySerializer: () => form,
        }),
      );
    },
    onSuccess: (result) => (result.committed ? queryClient.invalidateQueries({ queryKey: timesheetKeys.entries(periodId) }) : undefined),
  });
}
