import type { ValidationError } from '@nestjs/common';
import { DomainError } from '@tressury/domain';

export type FieldProblem = { field: string; message: string };

/** A request whose body, query or parameters break the DTO rules; every bad field is listed. */
export class ValidationFailedError extends DomainError {
  constructor(readonly problems: FieldProblem[]) {
    super('request.invalid', `Check these fields: ${[...new Set(problems.map((p) => p.field))].join(', ')}.`, 'invalid', problems[0]?.field);
  }
}

export function fieldProblems(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = /^\d+$/.test(error.property) ? `${parent}[${error.property}]` : parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...fieldProblems(error.children ?? [], field)];
  });
}
