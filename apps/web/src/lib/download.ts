import { ApiError } from './api-error';

/** The name the server gives in Content-Disposition (RFC 6266: filename* wins over filename). */
export function fileNameOf(disposition: string | null, fallback: string): string {
  if (!disposition) return fallback;
  const extended = /filename\*\s*=\s*UTF-8''([^;]+)/i.exec(disposition);
  if (extended?.[1]) {
    try {
      return decodeURIComponent(extended[1].trim());
    } catch {
      // A malformed escape: fall through to the plain name.
    }
  }
  const plain = /filename\s*=\s*"?([^";]+)"?/i.exec(disposition);
  return plain?.[1]?.trim() || fallback;
}

function save(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Let the browser start reading the blob before it is released.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

type BlobOutcome = { response: Response; data?: unknown; error?: unknown };

/**
 * Runs an authenticated `parseAs: 'blob'` request and saves the file under the server's name
 * (or `fallback`); answers the name saved. Errors come back as ApiError like every other call.
 */
export async function downloadFile(request: () => Promise<BlobOutcome>, fallback: string): Promise<string> {
  let outcome: BlobOutcome;
  try {
    outcome = await request();
  } catch {
    throw ApiError.from(0, undefined);
  }
  const { response, data, error } = outcome;
  if (!response.ok || !(data instanceof Blob)) throw ApiError.from(response.status, error);
  const fileName = fileNameOf(response.headers.get('Content-Disposition'), fallback);
  save(data, fileName);
  return fileName;
}
