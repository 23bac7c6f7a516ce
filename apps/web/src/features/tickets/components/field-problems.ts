import { ApiError } from '../../../lib/api-error';

export type Problems = Record<string, string>;

/** The server's `details` by field name ("components[0].amount"), several problems on one field joined. */
export function fieldProblems(error: unknown): Problems {
  const problems: Problems = {};
  if (error instanceof ApiError) {
    for (const { field, message } of error.details) problems[field] = problems[field] ? `${problems[field]} ${message}` : message;
  }
  return problems;
}

/** The server's words for a refusal that names no field of the form in front of the person. */
export function leftoverProblem(error: unknown, known: readonly string[]): string | null {
  const problems = fieldProblems(error);
  const onForm = Object.keys(problems).some((field) => known.some((name) => field === name || field.startsWith(`${name}[`) || field.startsWith(`${name}.`)));
  if (onForm) return null;
  return error instanceof Error ? error.message : 'Something went wrong.';
}
