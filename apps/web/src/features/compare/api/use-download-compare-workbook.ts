import { useMutation } from '@tanstack/react-query';
import { downloadFile } from '../../../lib/download';
import { http } from '../../../lib/http';
import type { CompareRange } from '../components/compare-range';

export type CompareWorkbook = { kind: 'comparison'; range: CompareRange } | { kind: 'fees'; branchId: string; month: string };

function request(workbook: CompareWorkbook) {
  if (workbook.kind === 'comparison') {
    const { from, to, rebookingDays } = workbook.range;
    return http.GET('/api/compare/branches.xlsx', { params: { query: { from, to, rebookingDays } }, parseAs: 'blob' });
  }
  return http.GET('/api/compare/fees/{branchId}.xlsx', { params: { path: { branchId: workbook.branchId }, query: { month: workbook.month } }, parseAs: 'blob' });
}

/** Fetches a comparison or fee-statement workbook with the signed-in token and saves it under the server's file name. */
export function useDownloadCompareWorkbook() {
  return useMutation({
    mutationFn: async (workbook: CompareWorkbook): Promise<string> => {
      const fallback = workbook.kind === 'comparison' ? `branches-${workbook.range.from}-${workbook.range.to}.xlsx` : `fees-${workbook.month}.xlsx`;
      return downloadFile(() => request(workbook), fallback);
    },
  });
}
