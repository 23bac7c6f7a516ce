import { useMutation } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type SentStatements = components['schemas']['SentStatementsView'];

/** E-mails every staff member of an approved run their statement; each message lands in the outbox, sent or failed. */
export function useSendStatements() {
  return useMutation({
    mutationFn: (runId: string) => expectData(http.POST('/api/payroll/runs/{id}/statements', { params: { path: { id: runId } } })),
  });
}
