import { type FieldProblem, ValidationFailedError } from '../common/validation-failed.error.js';

export type RowProblem = FieldProblem & { row: number };

/** A committed timesheet with bad rows: nothing is written, and every bad cell is listed with its row. */
export class TimesheetRejectedError extends ValidationFailedError {
  constructor(problems: RowProblem[], totalRows: number) {
    super(problems);
    const rows = [...new Set(problems.map((p) => p.row))];
    this.message = `Nothing was saved: ${rows.length} of ${totalRows} rows have errors (row${rows.length === 1 ? '' : 's'} ${rows.join(', ')}).`;
  }
}
