import { ValidationFailedError } from '../common/validation-failed.error.js';

/** The fields a PATCH actually sent: undefined means "not sent", null means "clear". */
export function definedOnly<T extends object>(changes: T): Partial<T> {
  return Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined)) as Partial<T>;
}

// PartialType makes every field optional, and class-validator lets null through an optional field.
/** Only the fields in `clearable` may be sent as null. */
export function refuseNulls(changes: object, clearable: readonly string[] = []): void {
  const problems = Object.entries(changes)
    .filter(([field, value]) => value === null && !clearable.includes(field))
    .map(([field]) => ({ field, message: `${field} cannot be cleared; send a value or leave it out` }));
  if (problems.length > 0) throw new ValidationFailedError(problems);
}
