import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type SheetKind = 'products' | 'services';
export type ImportResult = components['schemas']['ImportResultView'];
export type ImportRow = components['schemas']['ImportRowView'];

/**
 * Sends a spreadsheet in the multipart field "file": a preview (`commit` false) or the all-or-nothing save.
 * The generated type reads `format: binary` as text, so the body names the file and the serializer sends the file itself.
 */
export function sendSheet(kind: SheetKind, file: File, commit: boolean): Promise<ImportResult> {
  const form = new FormData();
  form.append('file', file);
  const options = { params: { query: { commit } }, body: { file: file.name }, bodySerializer: () => form };
  return expectData(
    kind === 'products' ? http.POST('/api/catalogue/products/import', options) : http.POST('/api/catalogue/services/import', options),
  );
}
