import { useMutation, useQueryClient } from '@tanstack/react-query';
import { catalogueKeys } from './catalogue-queries';
import { type SheetKind, sendSheet } from './send-sheet';

/** Writes every row of a checked spreadsheet, or nothing if any row is bad. */
export function useSaveSheet(kind: SheetKind) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => sendSheet(kind, file, true),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
