import type Big from 'big.js';
import { DomainError } from './errors.js';
import { parseDecimal } from './money.js';

export const INVALID_INPUT = 'domain.invalid_input';

export function invalid(field: string | undefined, message: string, code: string = INVALID_INPUT): DomainError {
  return new DomainError(code, message, 'invalid', field || undefined);
}

export function fieldPath(base: string, key: string | number): string {
  if (typeof key === 'number') return `${base}[${key}]`;
  return base ? `${base}.${key}` : key;
}

export function readObject(value: unknown, field: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw invalid(field, field ? `${field} must be an object` : 'The input must be an object');
  }
  return value as Record<string, unknown>;
}

export function readArray(value: unknown, field: string): unknown[] {
  if (!Array.isArray(value)) throw invalid(field, `${field} must be a list`);
  return value;
}

export function readString(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.trim() === '') throw invalid(field, `${field} must be a non-empty string`);
  return value;
}

export function readBoolean(value: unknown, field: string): boolean {
  if (typeof value !== 'boolean') throw invalid(field, `${field} must be true or false`);
  return value;
}

export function readChoice<T extends string>(value: unknown, choices: readonly T[], field: string): T {
  if (typeof value !== 'string' || !(choices as readonly string[]).includes(value)) {
    throw invalid(field, `${field} must be one of ${choices.map((c) => `"${c}"`).join(', ')}`);
  }
  return value as T;
}

type Range = { min?: Big | string; max?: Big | string; positive?: boolean; code?: string };

/** A decimal string within an optional inclusive range (or strictly above zero with `positive`). */
export function readDecimal(value: unknown, field: string, range: Range = {}): Big {
  const number = parseDecimal(value, field);
  const { min, max, positive, code } = range;
  if (positive && number.lte(0)) throw invalid(field, `${field} must be greater than 0`, code);
  if (min !== undefined && max !== undefined && (number.lt(min) || number.gt(max))) {
    throw invalid(field, `${field} must be between ${min.toString()} and ${max.toString()}`, code);
  }
  if (min !== undefined && number.lt(min)) {
    throw invalid(field, String(min) === '0' ? `${field} must not be negative` : `${field} must be at least ${min.toString()}`, code);
  }
  if (max !== undefined && number.gt(max)) throw invalid(field, `${field} must be at most ${max.toString()}`, code);
  return number;
}

export function readOptionalDecimal(value: unknown, field: string, fallback: string, range: Range = {}): Big {
  return readDecimal(value === undefined ? fallback : value, field, range);
}
