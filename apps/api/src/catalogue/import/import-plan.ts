import type { Sheet } from '../../common/spreadsheet-reader.js';
import type { FieldProblem } from '../../common/validation-failed.error.js';
import { importFileProblem, ImportRejectedError } from '../catalogue-errors.js';
import type { ImportResultView } from '../dto/import-result.view.js';

export type PlannedRow<Write, Existing> = {
  row: number;
  values: Record<string, string>;
  errors: FieldProblem[];
  action: 'create' | 'update' | 'unchanged';
  /** Set when the row is good. */
  write: Write | null;
  existing: Existing | null;
};

/** The sheet's rows as text by column heading, once every heading is known. */
export type KeyedRow = { row: number; values: Record<string, string> };

export const normaliseHeading = (heading: string): string => heading.trim().toLowerCase().replace(/[\s-]+/g, '_');

/**
 * Maps each heading to a column key: known columns by their normalised name, other columns through
 * `extra` (e.g. one price column per level). Unknown or repeated headings and missing required columns
 * are one 400 for the whole file, since no row can be read right without them.
 */
export function keyRows(
  sheet: Sheet,
  columns: { required: readonly string[]; optional: readonly string[] },
  extra: { key: (heading: string) => string | null; expected: string } = { key: () => null, expected: '' },
): KeyedRow[] {
  const known = new Set([...columns.required, ...columns.optional]);
  const problems: string[] = [];
  const keys = sheet.headers.map((heading, index) => {
    if (heading.trim() === '') {
      if (sheet.rows.some((row) => row.cells[index] !== '')) problems.push(`column ${index + 1} has values but no heading`);
      return null;
    }
    const key = known.has(normaliseHeading(heading)) ? normaliseHeading(heading) : extra.key(heading);
    if (key === null) problems.push(`unknown heading "${heading}"`);
    return key;
  });
  const present = keys.filter((key): key is string => key !== null);
  const repeated = [...new Set(present.filter((key, i) => present.indexOf(key) !== i))];
  for (const key of repeated) problems.push(`heading "${key}" appears more than once`);
  for (const key of columns.required) if (!present.includes(key)) problems.push(`the required column "${key}" is missing`);
  if (problems.length > 0) {
    const expected = [...columns.required, ...columns.optional, ...(extra.expected ? [extra.expected] : [])].join(', ');
    throw importFileProblem(`The header row does not fit: ${problems.join('; ')}. Expected headings: ${expected}.`);
  }
  return sheet.rows.map(({ row, cells }) => ({
    row,
    values: Object.fromEntries(keys.flatMap((key, i) => (key === null ? [] : [[key, cells[i] ?? '']]))),
  }));
}

/** Marks every row after the first with the same key (a product code, a service name). */
export function flagRepeats(rows: { row: number; key: string | null; problems: FieldProblem[] }[], column: string): void {
  const firstRow = new Map<string, number>();
  for (const row of rows) {
    if (row.key === null) continue;
    const first = firstRow.get(row.key);
    if (first === undefined) firstRow.set(row.key, row.row);
    else row.problems.push({ field: column, message: `${column} "${row.key}" is already on row ${first}; each may appear once` });
  }
}

export function toImportResult(rows: PlannedRow<unknown, unknown>[], committed: boolean): ImportResultView {
  const valid = rows.filter((row) => row.errors.length === 0);
  return {
    committed,
    rows: rows.map(({ row, action, values, errors }) => ({ row, action, values, errors })),
    validRows: valid.length,
    invalidRows: rows.length - valid.length,
    creates: valid.filter((row) => row.action === 'create').length,
    updates: valid.filter((row) => row.action === 'update').length,
    unchanged: valid.filter((row) => row.action === 'unchanged').length,
  };
}

/** All or nothing: one bad row refuses the whole commit. */
export function assertAllRowsGood(rows: PlannedRow<unknown, unknown>[]): void {
  const problems = rows.flatMap(({ row, errors }) => errors.map((error) => ({ row, ...error })));
  if (problems.length > 0) throw new ImportRejectedError(problems, rows.length);
}
