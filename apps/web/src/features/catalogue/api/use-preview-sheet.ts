import { useMutation } from '@tanstack/react-query';
import { type SheetKind, sendSheet } from './send-sheet';

/** Checks a spreadsheet row by row; nothing is written. */
export function usePreviewSheet(kind: SheetKind) {
  return useMutation({ mutationFn: (file: File) => sendSheet(kind, file, false) });
}
