import { ApiProperty } from '@nestjs/swagger';

export class ImportCellErrorView {
  /** The column heading of the bad cell, as in the file's header row (e.g. "container_cost"). */
  field: string;
  message: string;
}

export class ImportRowView {
  /** The row number as the spreadsheet shows it; the header is row 1. */
  row: number;
  /** What committing would do with the row: matched by code (products) or name (services). */
  action: 'create' | 'update' | 'unchanged';
  /** The row's cells as text, by column heading. */
  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' } })
  values: Record<string, string>;
  /** Empty when the row is good. */
  errors: ImportCellErrorView[];
}

export class ImportResultView {
  /** True when the rows were written; false for a preview. */
  committed: boolean;
  rows: ImportRowView[];
  validRows: number;
  invalidRows: number;
  /** Good rows that create a record. */
  creates: number;
  /** Good rows that change an existing record. */
  updates: number;
  /** Good rows identical to the existing record: nothing to write. */
  unchanged: number;
}
