import { useMutation } from '@tanstack/react-query';
import { downloadFile } from '../../../lib/download';
import { http } from '../../../lib/http';
import type { EarningsStatement } from './earnings-queries';

/** Fetches one of the caller's pay statements with the signed-in token and saves it under the server's file name. */
export function useDownloadStatement() {
  return useMutation({
    mutationFn: async (statement: EarningsStatement): Promise<string> => {
      return downloadFile(
        () => http.GET('/api/payroll/runs/{id}/lines/{lineId}/statement.xlsx', { params: { path: { id: statement.runId, lineId: statement.lineId } }, parseAs: 'blob' }),
        `pay-statement-${statement.startDate}-to-${statement.endDate}.xlsx`,
      );
    },
  });
}
