import { ApiProperty } from '@nestjs/swagger';

export class TimesheetCellErrorView {
  /** The column heading of the bad cell (staff_id, branch_id, date, hours). */
  field: string;
  message: string;
}

export class TimesheetImportRowView {
  /** The row number as the spreadsheet shows it; the header is row 1. */
  row: number;
  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' } })
  values: Record<string, string>;
  /** Empty when the row is good. */
  errors: TimesheetCellErrorView[];
}

export class TimesheetImportView {
  /** True when the hours were written; false for a preview. */
  committed: boolean;
  rows: TimesheetImportRowView[];
  validRows: number;
  invalidRows: number;
}
