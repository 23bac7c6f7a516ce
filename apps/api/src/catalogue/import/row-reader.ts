import Big from 'big.js';
import type { FieldProblem } from '../../common/validation-failed.error.js';

type DecimalRule = { min: string; max: string; scale: number; example: string };

const DECIMAL = /^-?\d{1,12}(\.\d+)?$/;
const FLAGS: Record<string, boolean> = { true: true, yes: true, y: true, '1': true, false: false, no: false, n: false, '0': false, '': false };

/**
 * Reads one spreadsheet row's text cells by column heading, collecting a problem for every bad cell
 * instead of stopping at the first, so the preview can name them all.
 */
export class RowReader {
  readonly problems: FieldProblem[] = [];

  constructor(readonly values: Readonly<Record<string, string>>) {}

  /** Whether the file has this column at all (an absent optional column leaves an existing value alone). */
  has(column: string): boolean {
    return column in this.values;
  }

  hasProblem(column: string): boolean {
    return this.problems.some((problem) => problem.field === column);
  }

  fail(column: string, message: string): null {
    this.problems.push({ field: column, message });
    return null;
  }

  text(column: string, maxLength: number): string | null {
    const value = this.values[column] ?? '';
    if (value === '') return this.fail(column, `${column} is required`);
    if (value.length > maxLength) return this.fail(column, `${column} must be at most ${maxLength} characters`);
    return value;
  }

  /** A decimal number typed as text; an empty cell is null. */
  decimal(column: string, rule: DecimalRule): string | null {
    const value = this.values[column] ?? '';
    if (value === '') return null;
    if (!DECIMAL.test(value)) return this.notANumber(column, value, `a number such as ${rule.example}`);
    if ((value.split('.')[1]?.length ?? 0) > rule.scale) return this.fail(column, `${column} may have at most ${rule.scale} decimal places`);
    const amount = new Big(value);
    if (amount.lt(rule.min) || amount.gt(rule.max)) return this.fail(column, `${column} must be from ${rule.min} to ${rule.max}`);
    return value;
  }

  requiredDecimal(column: string, rule: DecimalRule): string | null {
    if ((this.values[column] ?? '') === '') return this.fail(column, `${column} is required`);
    return this.decimal(column, rule);
  }

  wholeNumber(column: string, min: number, max: number): number | null {
    const value = this.values[column] ?? '';
    if (value === '') return this.fail(column, `${column} is required`);
    if (!/^\d{1,6}$/.test(value)) return this.notANumber(column, value, 'a whole number');
    const number = Number(value);
    if (number < min || number > max) return this.fail(column, `${column} must be from ${min} to ${max}`);
    return number;
  }

  /** One of `choices`, matched after `normalise` (case, spaces). */
  choice<T extends string>(column: string, choices: readonly T[], normalise: (value: string) => string): T | null {
    const value = this.values[column] ?? '';
    if (value === '') return this.fail(column, `${column} is required`);
    const found = choices.find((choice) => normalise(choice) === normalise(value));
    return found ?? this.fail(column, `${column} must be one of ${choices.join(', ')}`);
  }

  /** yes/no, true/false, y/n or 1/0; an empty cell is no. */
  flag(column: string): boolean | null {
    const found = FLAGS[(this.values[column] ?? '').toLowerCase()];
    return found ?? this.fail(column, `${column} must be yes or no`);
  }

  private notANumber(column: string, value: string, expected: string): null {
    // The reader never evaluates formulas (see common/spreadsheet-reader.ts): say so rather than "not a number".
    if (value.startsWith('=')) return this.fail(column, `${column} holds a formula (${value}); type its value instead`);
    return this.fail(column, `${column} must be ${expected}`);
  }
}

export const sameDecimal = (a: string | null, b: string | null): boolean => (a === null || b === null ? a === b : new Big(a).eq(b));
