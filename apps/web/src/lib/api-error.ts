export type FieldProblem = { field: string; message: string };

type ErrorBody = { code: string; message: string; details?: unknown };

const isErrorBody = (body: unknown): body is ErrorBody =>
  typeof body === 'object' && body !== null && typeof (body as ErrorBody).code === 'string' && typeof (body as ErrorBody).message === 'string';

const isFieldProblem = (value: unknown): value is FieldProblem =>
  typeof value === 'object' && value !== null && typeof (value as FieldProblem).field === 'string' && typeof (value as FieldProblem).message === 'string';

function fallbackMessage(status: number): string {
  if (status === 0) return 'Tressury could not reach its server. Check the connection and try again.';
  if (status >= 500) return 'The server could not finish this; nothing was saved. Try again in a moment.';
  return `The server refused the request (${status}).`;
}

/** A refused or failed request, carrying the server's `{ code, message, details }` so screens can show its words. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: FieldProblem[] = [],
  ) {
    super(message);
  }

  static from(status: number, body: unknown): ApiError {
    if (!isErrorBody(body)) return new ApiError(status, status === 0 ? 'network' : `http.${status}`, fallbackMessage(status));
    const details = Array.isArray(body.details) ? body.details.filter(isFieldProblem) : [];
    return new ApiError(status, body.code, body.message, details);
  }
}

export function errorMessage(error: unknown): string {
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
